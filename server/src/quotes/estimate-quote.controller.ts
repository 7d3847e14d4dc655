import { Body, Controller, Get, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiTags } from '@nestjs/swagger';
import type { EstimateQuoteStatus } from '@pondwright/shared';
import type { Response } from 'express';
import { ApiFileResponse, ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { QuoteLinksService } from './quote-links.service';
import { StaffQuotePdfService } from './staff-quote-pdf.service';
import { sendQuoteBodyDoc } from './dto/quote.dto';
import { sendPdf } from './send-pdf';

/** Staff's side of an estimate's quote: send, resend, revoke, follow and download. */
@ApiTags('quotes')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@Controller('estimates/:id')
export class EstimateQuoteController {
  constructor(
    private readonly links: QuoteLinksService,
    private readonly pdfs: StaffQuotePdfService,
  ) {}

  /** Body: `sendQuoteRequestSchema` (validated with the shared zod schema in the service). */
  @Post('send')
  @ApiBody({ schema: sendQuoteBodyDoc })
  @ApiJsonResponse(201, 'EstimateQuoteStatus', 'Sent: a new link, the e-mail queued in the outbox')
  send(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<EstimateQuoteStatus> {
    return this.links.send(id, body, user.userId);
  }

  @Get('quote')
  @ApiJsonResponse(200, 'EstimateQuoteStatus', 'The quote’s links, e-mails, answer and payments')
  status(@Param('id') id: string): Promise<EstimateQuoteStatus> {
    return this.links.status(id);
  }

  @Post('quote-links/:linkId/revoke')
  @HttpCode(200)
  @ApiJsonResponse(200, 'EstimateQuoteStatus', 'The link no longer opens the quote')
  revoke(
    @Param('id') id: string,
    @Param('linkId') linkId: string,
    @CurrentUser() user: Principal,
  ): Promise<EstimateQuoteStatus> {
    return this.links.revoke(id, linkId, user.userId);
  }

  @Get('quote.pdf')
  @ApiFileResponse('application/pdf', 'The quote as the homeowner sees it, as a PDF')
  async pdf(
    @Param('id') id: string,
    @CurrentUser() user: Principal,
    @Res() response: Response,
  ): Promise<void> {
    sendPdf(response, await this.pdfs.forEstimate(id, user.userId));
  }
}
