import { Global, Module } from '@nestjs/common';
import { DevMailboxController } from './dev-mailbox.controller';
import { MailAttachments } from './mail-attachments';
import { MailTransport } from './mail-transport';
import { OutboxController } from './outbox.controller';
import { OutboxService } from './outbox.service';

/**
 * E-mail for every module: the outbox (global, since many modules write to it), its SMTP transport, and
 * staff's route to send a given-up e-mail again.
 */
@Global()
@Module({
  controllers: [DevMailboxController, OutboxController],
  providers: [MailTransport, MailAttachments, OutboxService],
  exports: [OutboxService, MailAttachments],
})
export class MailModule {}
