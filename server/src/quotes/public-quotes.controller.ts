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
  view(@Param('token') token: string, @Req() request: Request): Promise<QuoteView> {
    return this.quotes.view(token, meta(request));
  }

  /** Body: `acceptQuoteRequestSchema`. */
  @Post('accept')
  @ApiBody({ schema: acceptQuoteBodyDoc })
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
  checkout(@Param('token') token: string): Promise<CheckoutRedirect> {
    return this.quotes.checkout(token);
  }

  @Get('pdf')
  async pdf(@Param('token') token: string, @Res() response: Response): Promise<void> {
    sendPdf(response, await this.quotes.pdf(token));
  }

  @Get('logo')
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
