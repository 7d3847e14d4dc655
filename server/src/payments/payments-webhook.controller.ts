import { Controller, Headers, HttpCode, Post, Req } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/auth.decorators';
import { PaymentsService, type WebhookOutcome } from './payments.service';

/**
 * The payment provider's webhook. Public, because the provider cannot sign in: its signature over the
 * raw body (kept raw by `configureApp` for this path) is what authenticates it.
 */
@ApiExcludeController()
@Controller('payments/webhook')
export class PaymentsWebhookController {
  constructor(private readonly payments: PaymentsService) {}

  @Public()
  @Post()
  @HttpCode(200)
  receive(
    @Req() request: Request,
    @Headers('stripe-signature') signature: string | undefined,
  ): Promise<WebhookOutcome> {
    const body = Buffer.isBuffer(request.body) ? (request.body as Buffer) : undefined;
    return this.payments.handleWebhook(body, signature);
  }
}
