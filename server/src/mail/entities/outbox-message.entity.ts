import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** An attachment the worker builds when it sends (so a large PDF is not stored twice). */
export type OutboxAttachment = { kind: 'quote-pdf'; linkId: string; filename: string };

/**
 * An e-mail waiting to be sent, sent, or given up on. Rows are written in the transaction of the change
 * that causes them, so a message exists exactly when its change does; the worker sends and marks them.
 */
@Entity({ name: 'outbox_messages' })
export class OutboxMessage {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Null for mail that belongs to no company yet (none so far, but kept open for sign-up mail). */
  @Column({ name: 'company_id', type: 'uuid', nullable: true })
  companyId: string | null;

  /** What the message is about, e.g. `quote-sent`, `invite`, `deposit-receipt`. */
  @Column({ type: 'text' })
  kind: string;

  /** The RFC 5322 Message-ID, fixed when the row is written so every retry carries the same one. */
  @Column({ name: 'message_id', type: 'text' })
  messageId: string;

  @Column({ name: 'to_address', type: 'text' })
  toAddress: string;

  @Column({ name: 'reply_to', type: 'text', nullable: true })
  replyTo: string | null;

  @Column({ type: 'text' })
  subject: string;

  @Column({ name: 'text_body', type: 'text' })
  textBody: string;

  @Column({ name: 'html_body', type: 'text', nullable: true })
  htmlBody: string | null;

  @Column({ type: 'jsonb', default: () => `'[]'::jsonb` })
  attachments: OutboxAttachment[];

  @Column({ type: 'text', default: 'pending' })
  status: 'pending' | 'sent' | 'failed';

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ name: 'next_attempt_at', type: 'timestamptz' })
  nextAttemptAt: Date;

  @Column({ name: 'locked_until', type: 'timestamptz', nullable: true })
  lockedUntil: Date | null;

  @Column({ name: 'last_error', type: 'text', nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  /** When a person last sent it again after it was given up on; `attempts` restarted from zero then. */
  @Column({ name: 'retried_at', type: 'timestamptz', nullable: true })
  retriedAt: Date | null;

  /** Who asked for that (a user of the message's company). */
  @Column({ name: 'retried_by', type: 'uuid', nullable: true })
  retriedById: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
