import { Controller, Headers, HttpCode, Post, Req } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBody, ApiHeader, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/auth.decorators';
import { PaymentsService, type WebhookOutcome } from './payments.service';

/**
 * The payment provider's webhook. Public, because the provider cannot sign in: its signature over the
 * raw body (kept raw by `configureApp` for this path) is what authenticates it.
 */
@ApiTags('payments (provider)')
@Controller('payments/webhook')
export class PaymentsWebhookController {
  constructor(private readonly payments: PaymentsService) {}

  @Public()
  @Post()
  @HttpCode(200)
  @ApiHeader({ name: 'stripe-signature', required: true, description: 'The provider’s signature' })
  @ApiBody({
    description: 'The provider’s event, read raw: the signature covers its exact bytes',
    schema: {
      type: 'object',
      properties: { id: { type: 'string' }, type: { type: 'string' }, data: { type: 'object' } },
    },
  })
  @ApiOkResponse({
    description: 'Recorded, or recognised as an event already recorded',
    schema: {
      type: 'object',
      properties: { received: { type: 'boolean', enum: [true] }, duplicate: { type: 'boolean' } },
      required: ['received', 'duplicate'],
    },
  })
  @ApiBadRequestResponse({ description: 'WEBHOOK_SIGNATURE_INVALID' })
  receive(
    @Req() request: Request,
    @Headers('stripe-signature') signature: string | undefined,
  ): Promise<WebhookOutcome> {
    const body = Buffer.isBuffer(request.body) ? (request.body as Buffer) : undefined;
    return this.payments.handleWebhook(body, signature);
  }
}
