import {
  Body,
  Controller,
  Get,
  Headers,
  HttpCode,
  Param,
  Post,
  Req,
  Res,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiTags } from '@nestjs/swagger';
import type { CheckoutRedirect, QuoteView } from '@pondwright/shared';
import type { Request, Response } from 'express';
import { ApiFileResponse, ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { Public } from '../common/decorators/auth.decorators';
import type { RequestMeta } from './public-link';
import { PublicLinkInterceptor } from './public-link.interceptor';
import { PublicQuotesService } from './public-quotes.service';
import { acceptQuoteBodyDoc, declineQuoteBodyDoc } from './dto/quote.dto';
import { sendPdf } from './send-pdf';

/**
 * The homeowner's quote, reached by the link's token alone. Answers are never cached: each carries the
 * homeowner's name and prices, and "viewed" must be recorded by the server (PublicLinkInterceptor sends
 * `no-store` and slows an address that tries wrong tokens).
 */
@ApiTags('quotes (public)')
@Public()
@UseInterceptors(PublicLinkInterceptor)
@Controller('quotes/:token')
export class PublicQuotesController {
  constructor(private readonly quotes: PublicQuotesService) {}

  @Get()
  @ApiJsonResponse(200, 'QuoteView', 'The quote; the first view is recorded')
  view(@Param('token') token: string, @Req() request: Request): Promise<QuoteView> {
    return this.quotes.view(token, meta(request));
  }

  /** Body: `acceptQuoteRequestSchema`. */
  @Post('accept')
  @ApiBody({ schema: acceptQuoteBodyDoc })
  @ApiJsonResponse(200, 'QuoteView', 'Accepted with the chosen options; the deposit is due')
  @HttpCode(200)
  accept(
    @Param('token') token: string,
    @Body() body: unknown,
    @Req() request: Request,
  ): Promise<QuoteView> {
    return this.quotes.accept(token, body, meta(request));
  }

  /** Body: `declineQuoteRequestSchema`. */
  @Post('decline')
  @ApiBody({ schema: declineQuoteBodyDoc })
  @ApiJsonResponse(200, 'QuoteView', 'Declined, with the homeowner’s reason if given')
  @HttpCode(200)
  decline(
    @Param('token') token: string,
    @Body() body: unknown,
    @Req() request: Request,
  ): Promise<QuoteView> {
    return this.quotes.decline(token, body, meta(request));
  }

  @Post('checkout')
  @HttpCode(200)
  @ApiJsonResponse(200, 'CheckoutRedirect', 'The payment provider’s checkout page for the deposit')
  checkout(@Param('token') token: string): Promise<CheckoutRedirect> {
    return this.quotes.checkout(token);
  }

  @Get('pdf')
  @ApiFileResponse('application/pdf', 'The quote as a PDF')
  async pdf(@Param('token') token: string, @Res() response: Response): Promise<void> {
    sendPdf(response, await this.quotes.pdf(token));
  }

  @Get('logo')
  @ApiFileResponse('image/*', 'The company’s logo (PNG or JPEG), with an ETag; 304 when unchanged')
  async logo(
    @Param('token') token: string,
    @Headers('if-none-match') ifNoneMatch: string | undefined,
    @Res() response: Response,
  ): Promise<void> {
    const logo = await this.quotes.logo(token);
    const etag = `"${logo.sha256}"`;
    response.setHeader('ETag', etag).setHeader('Cache-Control', 'private, max-age=3600');
    if (ifNoneMatch === etag) {
      response.status(304).end();
      return;
    }
    response.status(200).type(logo.contentType).send(logo.bytes);
  }
}

function meta(request: Request): RequestMeta {
  return { ip: request.ip ?? 'unknown', userAgent: request.get('user-agent') ?? 'unknown' };
}
