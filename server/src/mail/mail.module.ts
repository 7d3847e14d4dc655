import { Global, Module } from '@nestjs/common';
import { DevMailboxController } from './dev-mailbox.controller';
import { MailTransport } from './mail-transport';
import { OutboxService } from './outbox.service';

/** E-mail for every module: the outbox (global, since many modules write to it) and its SMTP transport. */
@Global()
@Module({
  controllers: [DevMailboxController],
  providers: [MailTransport, OutboxService],
  exports: [OutboxService],
})
export class MailModule {}
