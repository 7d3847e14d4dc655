import { Module } from '@nestjs/common';
import { AppConfig } from '../config/app-config';
import { PaymentsService } from './payments.service';
import { PaymentsWebhookController } from './payments-webhook.controller';
import { createStripeClient, STRIPE_CLIENT } from './stripe-client';

@Module({
  controllers: [PaymentsWebhookController],
  providers: [
    { provide: STRIPE_CLIENT, inject: [AppConfig], useFactory: createStripeClient },
    PaymentsService,
  ],
  exports: [PaymentsService],
})
export class PaymentsModule {}
