import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppConfig } from '../src/config/app-config';
import { startFakeSmtp, type FakeSmtp } from '../src/dev-fakes/fake-smtp';
import { MailAttachments } from '../src/mail/mail-attachments';
import { MailTransport, type OutgoingMail } from '../src/mail/mail-transport';
import { OutboxService } from '../src/mail/outbox.service';
import { approvedEstimate } from './support/quote-fixtures';
import { bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

/**
 * The outbox under the failures it exists for: a mail server that is away, a transaction that rolls
 * back after queueing, and several workers (or server instances) draining the same table at once.
 * "Exactly once" is checked where it matters, at the receiving server, by Message-ID.
 */
let testApp: TestApp;
let smtp: FakeSmtp;
let outbox: OutboxService;

beforeAll(async () => {
  smtp = await startFakeSmtp({ smtpPort: 0, httpPort: 0 });
  testApp = await createTestApp({ SMTP_PORT: String(smtp.smtpPort) });
  outbox = testApp.app.get(OutboxService);
  // Earlier test files leave mail queued (their apps run no worker): not this file's to send.
  await testApp.dataSource.query(`DELETE FROM outbox_messages`);
});
afterAll(async () => {
  await testApp.close();
  await smtp.stop();
});

type Row = {
  id: string;
  message_id: string;
  status: string;
  attempts: number;
  last_error: string | null;
  /** next_attempt_at, in milliseconds since the epoch. */
  due_at: number;
};

async function rows(ids: string[]): Promise<Row[]> {
  return (await testApp.dataSource.query(
    `SELECT id, message_id, status, attempts, last_error,
            (extract(epoch FROM next_attempt_at) * 1000)::float AS due_at
     FROM outbox_messages WHERE id = ANY($1) ORDER BY created_at`,
    [ids],
  )) as Row[];
}

/**
 * Runs one drain and checks the back-off it set on every message: `seconds` ± 20 % from the moment
 * the attempt failed (somewhere within the drain).
 */
async function drainExpectingBackOff(ids: string[], seconds: number): Promise<void> {
  const started = Date.now();
  expect(await outbox.drain()).toBe(0);
  const finished = Date.now();
  for (const row of await rows(ids)) {
    expect(row.due_at).toBeGreaterThanOrEqual(started + seconds * 800 - 50);
    expect(row.due_at).toBeLessThanOrEqual(finished + seconds * 1200 + 50);
  }
}

/** What the back-off would wait for, without waiting: the messages are due now. */
async function timePasses(ids: string[]): Promise<void> {
  await testApp.dataSource.query(
    `UPDATE outbox_messages SET next_attempt_at = now() WHERE id = ANY($1) AND status = 'pending'`,
    [ids],
  );
}

/** How many copies of each of `messageIds` the mail server received. */
function copiesAtServer(messageIds: string[]): number[] {
  const received = smtp.messages().map((message) => message.messageId);
  return messageIds.map((id) => received.filter((messageId) => messageId === id).length);
}

/** `count` messages queued in one committed transaction, straight through the outbox. */
async function enqueued(count: number, label: string): Promise<string[]> {
  return testApp.dataSource.transaction(async (manager) => {
    const ids: string[] = [];
    for (let index = 0; index < count; index += 1) {
      const message = await outbox.enqueue(manager, {
        companyId: null,
        kind: 'test',
        to: `reader.${index}@example.test`,
        subject: `${label} #${index}`,
        text: `Message ${index} of ${label}.`,
      });
      ids.push(message.id);
    }
    return ids;
  });
}

/** Another worker sharing only the database, as a second server instance would run. */
function anotherWorker(app: TestApp, transport?: Pick<MailTransport, 'send'>): OutboxService {
  return new OutboxService(
    app.dataSource,
    (transport ?? app.app.get(MailTransport)) as MailTransport,
    app.app.get(AppConfig),
    app.app.get(MailAttachments),
  );
}

describe('the outbox through an SMTP outage', () => {
  it('keeps every message through the outage, retries with back-off and delivers each exactly once when the server is back', async () => {
    const owner = await signupCompany(testApp);
    const invited = Array.from({ length: 20 }, (_, index) => `crew.${index}@example.test`);
    const { smtpPort, httpPort } = smtp;
    await smtp.stop();
    let ids: string[];
    try {
      // Real writes that queue mail: twenty invitations and a quote with its PDF.
      for (const email of invited) {
        await testApp
          .http()
          .post('/api/invites')
          .set(...bearer(owner))
          .send({ email, role: 'crew_lead' })
          .expect(201);
      }
      const estimate = await approvedEstimate(testApp, owner);
      await testApp
        .http()
        .post(`/api/estimates/${estimate.id}/send`)
        .set(...bearer(owner))
        .send({ recipientEmail: 'wren@example.test' })
        .expect(201);
      ids = (
        (await testApp.dataSource.query(
          `SELECT id FROM outbox_messages WHERE company_id = $1 ORDER BY created_at`,
          [owner.companyId],
        )) as Array<{ id: string }>
      ).map((row) => row.id);
      expect(ids).toHaveLength(21);

      // First attempt: refused, kept, due again in 5 s ± 20 %.
      await drainExpectingBackOff(ids, 5);
      let queued = await rows(ids);
      expect(queued.every((row) => row.status === 'pending' && row.attempts === 1)).toBe(true);
      expect(queued.every((row) => /ECONNREFUSED/.test(row.last_error ?? ''))).toBe(true);
      // Not due yet: nothing is tried and no attempt is spent.
      expect(await outbox.drain()).toBe(0);
      expect((await rows(ids)).every((row) => row.attempts === 1)).toBe(true);

      // Second attempt, still down: the wait doubles (10 s ± 20 %).
      await timePasses(ids);
      await drainExpectingBackOff(ids, 10);
      queued = await rows(ids);
      expect(queued.every((row) => row.status === 'pending' && row.attempts === 2)).toBe(true);
    } finally {
      // Back on the same port, with an empty mailbox.
      smtp = await startFakeSmtp({ smtpPort, httpPort });
    }

    // Recovery: not before the back-off has passed, then every message, once.
    expect(await outbox.drain()).toBe(0);
    await timePasses(ids);
    expect(await outbox.drain()).toBe(21);
    expect(await outbox.drain()).toBe(0);
    const delivered = await rows(ids);
    expect(delivered.every((row) => row.status === 'sent' && row.attempts === 3)).toBe(true);
    expect(delivered.every((row) => row.last_error === null)).toBe(true);
    const messageIds = delivered.map((row) => row.message_id);
    expect(new Set(messageIds).size).toBe(21);
    expect(copiesAtServer(messageIds)).toEqual(messageIds.map(() => 1));
    const recipients = smtp.messages().flatMap((message) => message.to);
    expect(recipients).toEqual(expect.arrayContaining([...invited, 'wren@example.test']));
    const quote = smtp.messages().find((message) => message.to.includes('wren@example.test'));
    expect(quote!.attachments.map((attachment) => attachment.filename)).toEqual([
      expect.stringMatching(/^quote-\d+\.pdf$/),
    ]);
  });
});

describe('a rolled-back transaction', () => {
  it('sends nothing that was queued in a transaction that threw', async () => {
    smtp.clear();
    const subject = `Never sent ${randomBytes(4).toString('hex')}`;
    await expect(
      testApp.dataSource.transaction(async (manager) => {
        await outbox.enqueue(manager, {
          companyId: null,
          kind: 'test',
          to: 'nobody@example.test',
          subject,
          text: 'This change was rolled back.',
        });
        throw new Error('the change failed after its e-mail was queued');
      }),
    ).rejects.toThrow(/failed after its e-mail was queued/);
    const [{ n }] = (await testApp.dataSource.query(
      `SELECT count(*)::int AS n FROM outbox_messages WHERE subject = $1`,
      [subject],
    )) as [{ n: number }];
    expect(n).toBe(0);
    expect(await outbox.drain()).toBe(0);
    expect(smtp.messages()).toEqual([]);
  });

  it('sends no quote when sending fails after the e-mail was queued, and leaves the estimate as it was', async () => {
    smtp.clear();
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const recipient = `rollback.${randomBytes(4).toString('hex')}@example.test`;
    // The send's last statement, the audit event after the outbox insert, fails for this recipient
    // only, as a constraint or a lost connection at that point would.
    await testApp.dataSource.query(`
      CREATE FUNCTION fail_quote_event_for_test() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF NEW.action = 'quote-sent' AND NEW.detail ->> 'recipientEmail' = '${recipient}' THEN
          RAISE EXCEPTION 'refused for the rollback test';
        END IF;
        RETURN NEW;
      END $$`);
    await testApp.dataSource.query(`
      CREATE TRIGGER fail_quote_event_for_test BEFORE INSERT ON estimate_events
      FOR EACH ROW EXECUTE FUNCTION fail_quote_event_for_test()`);
    try {
      const response = await testApp
        .http()
        .post(`/api/estimates/${estimate.id}/send`)
        .set(...bearer(owner))
        .send({ recipientEmail: recipient });
      expect(response.status).toBe(500);
    } finally {
      await testApp.dataSource.query(
        `DROP TRIGGER fail_quote_event_for_test ON estimate_events;
         DROP FUNCTION fail_quote_event_for_test()`,
      );
    }
    const [state] = (await testApp.dataSource.query(
      `SELECT e.status,
              (SELECT count(*)::int FROM outbox_messages WHERE to_address = $2) AS mails,
              (SELECT count(*)::int FROM quote_links WHERE estimate_id = e.id) AS links
       FROM estimates e WHERE e.id = $1`,
      [estimate.id, recipient],
    )) as Array<{ status: string; mails: number; links: number }>;
    expect(state).toEqual({ status: 'approved', mails: 0, links: 0 });
    expect(await outbox.drain()).toBe(0);
    expect(smtp.messages().filter((message) => message.to.includes(recipient))).toEqual([]);
  });
});

describe('workers draining at once', () => {
  it('never sends one message twice with two server instances and a third worker racing', async () => {
    smtp.clear();
    const ids = await enqueued(150, 'Race');
    const worker = { OUTBOX_WORKER: 'on', OUTBOX_POLL_MS: '50', SMTP_PORT: String(smtp.smtpPort) };
    // Two more instances of the app, each with its own pool and its worker polling every 50 ms.
    const instances = [await createTestApp(worker), await createTestApp(worker)];
    try {
      const third = anotherWorker(testApp);
      const deadline = Date.now() + 30_000;
      let pending = ids.length;
      let sentHere = 0;
      while (pending > 0 && Date.now() < deadline) {
        const counts = await Promise.all([third.drain(), outbox.drain()]);
        sentHere += counts[0] + counts[1];
        const [row] = (await testApp.dataSource.query(
          `SELECT count(*)::int AS n FROM outbox_messages WHERE id = ANY($1) AND status <> 'sent'`,
          [ids],
        )) as [{ n: number }];
        pending = row.n;
      }
      expect(pending).toBe(0);
      console.info(
        `[outbox] 150 messages: ${sentHere} sent by the two workers here, ${150 - sentHere} by the instances' own`,
      );
    } finally {
      await Promise.all(instances.map((instance) => instance.close()));
    }
    const sent = await rows(ids);
    expect(sent.every((row) => row.status === 'sent' && row.attempts === 1)).toBe(true);
    const messageIds = sent.map((row) => row.message_id);
    expect(copiesAtServer(messageIds)).toEqual(messageIds.map(() => 1));
    expect(smtp.messages().filter((message) => message.subject.startsWith('Race #'))).toHaveLength(
      150,
    );
  }, 60_000);

  it('never sends a message twice when a worker held up by a slow mail server outlives its lease', async () => {
    smtp.clear();
    const ids = await enqueued(5, 'Slow relay');
    // Worker A's mail server takes its time over the first message (a tarpitting relay).
    let heldUp: (messageId: string) => void;
    const isHeldUp = new Promise<string>((resolve) => (heldUp = resolve));
    let letGo: () => void;
    const goOn = new Promise<void>((resolve) => (letGo = resolve));
    const transport = testApp.app.get(MailTransport);
    let first = true;
    const slow = {
      send: async (mail: OutgoingMail) => {
        if (first) {
          first = false;
          heldUp(mail.messageId);
          await goOn;
        }
        await transport.send(mail);
      },
    };
    const workerA = anotherWorker(testApp, slow);
    const workerB = anotherWorker(testApp);
    const drainingA = workerA.drain();
    const slowMessageId = await isHeldUp;
    // Meanwhile the lease A took on the messages it has not sent yet runs out (120 s in real life):
    // worker B, another instance, takes them over and delivers them.
    await testApp.dataSource.query(
      `UPDATE outbox_messages SET locked_until = now() - interval '1 second'
       WHERE id = ANY($1) AND message_id <> $2 AND locked_until IS NOT NULL`,
      [ids, slowMessageId],
    );
    const sentByB = await workerB.drain();
    letGo!();
    const sentByA = await drainingA;

    const sent = await rows(ids);
    const messageIds = sent.map((row) => row.message_id);
    console.info(`[outbox] slow worker sent ${sentByA}, the other ${sentByB}`);
    expect(sent.every((row) => row.status === 'sent')).toBe(true);
    expect(copiesAtServer(messageIds)).toEqual(messageIds.map(() => 1));
    expect(sentByA + sentByB).toBe(5);
  });
});
