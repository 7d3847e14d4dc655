import { Global, Module } from '@nestjs/common';
import { DevMailboxController } from './dev-mailbox.controller';
import { MailAttachments } from './mail-attachments';
import { MailTransport } from './mail-transport';
import { OutboxService } from './outbox.service';

/** E-mail for every module: the outbox (global, since many modules write to it) and its SMTP transport. */
@Global()
@Module({
  controllers: [DevMailboxController],
  providers: [MailTransport, MailAttachments, OutboxService],
  exports: [OutboxService, MailAttachments],
})
export class MailModule {}
