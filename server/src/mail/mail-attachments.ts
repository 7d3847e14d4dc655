import { Injectable } from '@nestjs/common';
import type { OutboxAttachment } from './entities/outbox-message.entity';

export type BuiltAttachment = { filename: string; content: Buffer; contentType: string };
type AttachmentBuilder = (attachment: OutboxAttachment) => Promise<BuiltAttachment>;

/**
 * How each kind of attachment is built when its e-mail is sent: other modules register a builder (the
 * quotes module builds the quote PDF), so the mail module needs to know nothing of them.
 */
@Injectable()
export class MailAttachments {
  private readonly builders = new Map<OutboxAttachment['kind'], AttachmentBuilder>();

  register(kind: OutboxAttachment['kind'], builder: AttachmentBuilder): void {
    this.builders.set(kind, builder);
  }

  build(attachment: OutboxAttachment): Promise<BuiltAttachment> {
    const builder = this.builders.get(attachment.kind);
    if (!builder) throw new Error(`No builder for attachment kind ${attachment.kind}`);
    return builder(attachment);
  }
}
