import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { EmailDeliveryView } from '@pondwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { isUuid } from '../common/tenancy/tenant-repository';
import { AppConfig } from '../config/app-config';
import { emailDeliveryView, type EmailDeliveryRow } from './email-delivery';
import { OutboxMessage, type OutboxAttachment } from './entities/outbox-message.entity';
import { MailAttachments } from './mail-attachments';
import { MailTransport } from './mail-transport';

export type NewMail = {
  companyId: string | null;
  kind: string;
  to: string;
  replyTo?: string | null;
  subject: string;
  text: string;
  html?: string | null;
  attachments?: OutboxAttachment[];
};

/** After this many failed attempts a message is marked failed and left for a person to look at. */
export const MAX_ATTEMPTS = 10;
/** How long a claimed message is reserved for the worker that claimed it. */
const LEASE_SECONDS = 120;

/**
 * The transactional outbox: `enqueue` writes the message with the caller's transaction, so it exists
 * exactly when the change that caused it was committed; `drain` sends what is due.
 *
 * Sending is at-least-once in theory and exactly-once in practice: a message is claimed with a lease
 * (`FOR UPDATE SKIP LOCKED`, so two workers or two instances never take the same row), sent, and
 * marked sent straight away; a failed attempt is retried later with exponential back-off. Only a crash
 * between the SMTP server's "250 OK" and the mark could send it twice, and then both copies carry the
 * same Message-ID for the receiving system to fold together.
 */
@Injectable()
export class OutboxService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(OutboxService.name);
  private timer: NodeJS.Timeout | null = null;
  private draining: Promise<number> | null = null;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly transport: MailTransport,
    private readonly config: AppConfig,
    private readonly attachments: MailAttachments,
  ) {}

  /** Writes the message in `manager`'s transaction; nothing is sent until it commits. */
  async enqueue(manager: EntityManager, mail: NewMail): Promise<OutboxMessage> {
    const domain = /@([^>\s]+)>?\s*$/.exec(this.config.smtp.from)?.[1] ?? 'pondwright.local';
    return manager.save(
      manager.create(OutboxMessage, {
        companyId: mail.companyId,
        kind: mail.kind,
        messageId: `<${randomUUID()}@${domain}>`,
        toAddress: mail.to,
        replyTo: mail.replyTo ?? null,
        subject: mail.subject,
        textBody: mail.text,
        htmlBody: mail.html ?? null,
        attachments: mail.attachments ?? [],
        status: 'pending',
        attempts: 0,
        nextAttemptAt: new Date(),
      }),
    );
  }

  /**
   * Puts a message the worker gave up on back in the queue, due now with its attempts restarted from
   * zero, and records who asked and when. The Message-ID stays, so should the earlier attempts have
   * reached the recipient after all, the copies are still recognisably one message. 404 `NOT_FOUND`
   * for another company's message (or a malformed id), 409 `MAIL_NOT_FAILED` for one that is still
   * queued or was sent (two people pressing at once: only the first puts it back).
   */
  async retry(id: string, companyId: string, actorId: string): Promise<EmailDeliveryView> {
    if (!isUuid(id)) throw new AppError('NOT_FOUND', 'E-mail not found');
    const [rows] = (await this.dataSource.query(
      `UPDATE outbox_messages
       SET status = 'pending', attempts = 0, next_attempt_at = now(), locked_until = NULL,
           retried_at = now(), retried_by = $3
       WHERE id = $1 AND company_id = $2 AND status = 'failed'
       RETURNING id, status, attempts, last_error, sent_at, retried_at`,
      [id, companyId, actorId],
    )) as [EmailDeliveryRow[], number];
    if (rows[0]) return emailDeliveryView(rows[0]);
    const [current] = (await this.dataSource.query(
      `SELECT status FROM outbox_messages WHERE id = $1 AND company_id = $2`,
      [id, companyId],
    )) as Array<{ status: EmailDeliveryView['status'] }>;
    if (!current) throw new AppError('NOT_FOUND', 'E-mail not found');
    throw new AppError(
      'MAIL_NOT_FAILED',
      current.status === 'sent'
        ? 'This e-mail was delivered; there is nothing to send again.'
        : 'This e-mail is still queued; the outbox keeps trying to send it.',
    );
  }

  onApplicationBootstrap(): void {
    const { workerEnabled, pollMs } = this.config.outbox;
    if (!workerEnabled) return;
    this.timer = setInterval(() => void this.drain().catch(() => undefined), pollMs);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.draining?.catch(() => undefined);
  }

  /**
   * Sends every message that is due, a batch at a time, and answers how many were sent. Calls made while
   * a drain is running wait for it instead of starting a second one in this process.
   */
  drain(): Promise<number> {
    if (!this.draining) {
      this.draining = this.drainBatches().finally(() => {
        this.draining = null;
      });
    }
    return this.draining;
  }

  private async drainBatches(): Promise<number> {
    let sent = 0;
    for (;;) {
      // One message per claim, so a lease only ever covers the one send it was taken for. Claimed
      // twenty at a time, a slow mail server (twenty sends outlasting the 120 s lease) let the lease
      // run out on messages still waiting in this worker's batch: another instance took them over
      // and both sent them (test/outbox-reliability.e2e-spec.ts).
      const batch = await this.claim(1);
      if (batch.length === 0) return sent;
      for (const message of batch) {
        if (await this.attempt(message)) sent += 1;
      }
    }
  }

  /** Takes up to `limit` due messages with a lease, skipping rows another worker holds. */
  private async claim(limit: number): Promise<OutboxMessage[]> {
    const rows = (await this.dataSource.query(
      `UPDATE outbox_messages SET locked_until = now() + make_interval(secs => $2), attempts = attempts + 1
       WHERE id IN (
         SELECT id FROM outbox_messages
         WHERE status = 'pending' AND next_attempt_at <= now()
           AND (locked_until IS NULL OR locked_until < now())
         ORDER BY next_attempt_at, created_at
         LIMIT $1
         FOR UPDATE SKIP LOCKED)
       RETURNING id`,
      [limit, LEASE_SECONDS],
    )) as [Array<{ id: string }>, number];
    const ids = rows[0].map((row) => row.id);
    if (ids.length === 0) return [];
    return this.dataSource.manager
      .getRepository(OutboxMessage)
      .createQueryBuilder('m')
      .where('m.id IN (:...ids)', { ids })
      .orderBy('m.created_at')
      .getMany();
  }

  private async attempt(message: OutboxMessage): Promise<boolean> {
    try {
      const attachments = await Promise.all(
        message.attachments.map((attachment) => this.attachments.build(attachment)),
      );
      await this.transport.send({
        messageId: message.messageId,
        to: message.toAddress,
        replyTo: message.replyTo,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody,
        attachments,
      });
    } catch (error) {
      await this.recordFailure(message, error);
      return false;
    }
    await this.dataSource.query(
      `UPDATE outbox_messages SET status = 'sent', sent_at = now(), locked_until = NULL, last_error = NULL
       WHERE id = $1`,
      [message.id],
    );
    return true;
  }

  private async recordFailure(message: OutboxMessage, error: unknown): Promise<void> {
    const reason = error instanceof Error ? error.message : String(error);
    const giveUp = message.attempts >= MAX_ATTEMPTS;
    this.logger.warn(
      `E-mail ${message.id} (${message.kind}) attempt ${message.attempts} failed: ${reason}${giveUp ? '; giving up' : ''}`,
    );
    await this.dataSource.query(
      `UPDATE outbox_messages
       SET status = $2, last_error = $3, locked_until = NULL,
           next_attempt_at = now() + make_interval(secs => $4)
       WHERE id = $1`,
      [
        message.id,
        giveUp ? 'failed' : 'pending',
        reason.slice(0, 2000),
        retryDelaySeconds(message.attempts),
      ],
    );
  }
}

/**
 * Exponential back-off from 5 s, doubling per attempt up to an hour, with ±20 % jitter so messages that
 * failed together (an SMTP outage) do not all retry in the same second.
 */
export function retryDelaySeconds(attempts: number, random: () => number = Math.random): number {
  const base = Math.min(5 * 2 ** Math.max(0, attempts - 1), 3600);
  return Math.round(base * (0.8 + 0.4 * random()));
}
