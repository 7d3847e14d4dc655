import type { EmailDeliveryView, EstimateQuoteStatus } from '@pondwright/shared';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../src/dev-fakes/fake-smtp';
import { MAX_ATTEMPTS, OutboxService } from '../src/mail/outbox.service';
import { approvedEstimate } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

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
beforeEach(() => smtp.clear());

type Owner = Awaited<ReturnType<typeof signupCompany>>;

function retry(session: { accessToken: string }, id: string) {
  return testApp
    .http()
    .post(`/api/outbox/${id}/retry`)
    .set(...bearer(session));
}

async function quoteStatus(owner: Owner, estimateId: string): Promise<EstimateQuoteStatus> {
  return (
    await testApp
      .http()
      .get(`/api/estimates/${estimateId}/quote`)
      .set(...bearer(owner))
      .expect(200)
  ).body as EstimateQuoteStatus;
}

type StoredMessage = {
  status: string;
  attempts: number;
  message_id: string;
  retried_by: string | null;
  retried_at: Date | null;
  due: boolean;
};

async function stored(id: string): Promise<StoredMessage> {
  const [row] = (await testApp.dataSource.query(
    `SELECT status, attempts, message_id, retried_by, retried_at, next_attempt_at <= now() AS due
     FROM outbox_messages WHERE id = $1`,
    [id],
  )) as StoredMessage[];
  return row!;
}

/**
 * Sends the estimate's quote while the mail server is down, on the last attempt the outbox allows, so
 * the worker gives up on it for real; answers the link's e-mail as staff see it.
 */
async function quoteThatGaveUp(owner: Owner, estimateId: string): Promise<EmailDeliveryView> {
  await testApp
    .http()
    .post(`/api/estimates/${estimateId}/send`)
    .set(...bearer(owner))
    .send({ recipientEmail: 'wren@example.test' })
    .expect(201);
  await testApp.dataSource.query(
    `UPDATE outbox_messages SET attempts = $2 WHERE company_id = $1 AND kind = 'quote-sent'`,
    [owner.companyId, MAX_ATTEMPTS - 1],
  );
  const { smtpPort, httpPort } = smtp;
  await smtp.stop();
  try {
    expect(await outbox.drain()).toBe(0);
  } finally {
    smtp = await startFakeSmtp({ smtpPort, httpPort });
  }
  const email = (await quoteStatus(owner, estimateId)).links[0]!.email!;
  expect(email).toMatchObject({ status: 'failed', attempts: MAX_ATTEMPTS, retriedAt: null });
  expect(email.lastError).toMatch(/ECONNREFUSED/);
  return email;
}

describe('sending a given-up e-mail again', () => {
  it('queues it again for the owner, keeps its Message-ID, and the worker delivers it once', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const gaveUp = await quoteThatGaveUp(owner, estimate.id);
    const before = await stored(gaveUp.id);
    // Given up means left alone: the worker does not pick it up by itself.
    expect(await outbox.drain()).toBe(0);

    const response = await retry(owner, gaveUp.id).expect(200);
    expect(response.body).toMatchObject({
      id: gaveUp.id,
      status: 'pending',
      attempts: 0,
      sentAt: null,
    });
    expect((response.body as EmailDeliveryView).retriedAt).toEqual(expect.any(String));
    const queued = await stored(gaveUp.id);
    expect(queued).toMatchObject({
      status: 'pending',
      attempts: 0,
      due: true,
      message_id: before.message_id,
      retried_by: owner.userId,
    });
    expect(queued.retried_at).toBeInstanceOf(Date);
    // A second press while it is queued changes nothing.
    const twice = await retry(owner, gaveUp.id).expect(409);
    expect(twice.body).toMatchObject({ code: 'MAIL_NOT_FAILED' });
    expect(twice.body.message).toMatch(/still queued/);

    expect(await outbox.drain()).toBe(1);
    expect(await outbox.drain()).toBe(0);
    const copies = smtp.messages().filter((m) => m.subject.includes(`No. ${estimate.number}`));
    expect(copies).toHaveLength(1);
    expect(copies[0]!.messageId).toBe(before.message_id);
    expect(copies[0]!.to).toEqual(['wren@example.test']);

    const delivered = (await quoteStatus(owner, estimate.id)).links[0]!.email;
    expect(delivered).toMatchObject({
      id: gaveUp.id,
      status: 'sent',
      attempts: 1,
      lastError: null,
      sentAt: expect.any(String),
      retriedAt: expect.any(String),
    });
    const again = await retry(owner, gaveUp.id).expect(409);
    expect(again.body).toMatchObject({ code: 'MAIL_NOT_FAILED' });
    expect(again.body.message).toMatch(/delivered/);
  });

  it('lets an estimator send again any kind of e-mail, such as an invitation', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: 'new.crew@example.test', role: 'crew_lead' })
      .expect(201);
    const [invite] = (await testApp.dataSource.query(
      `UPDATE outbox_messages SET status = 'failed', attempts = $3, last_error = '550 no such user'
       WHERE company_id = $1 AND to_address = $2 RETURNING id`,
      [owner.companyId, 'new.crew@example.test', MAX_ATTEMPTS],
    )) as [Array<{ id: string }>, number];

    await retry(estimator, invite[0]!.id).expect(200);
    expect(await stored(invite[0]!.id)).toMatchObject({
      status: 'pending',
      retried_by: estimator.userId,
    });
  });

  it('is not for crew leads, and finds nothing of another company or under a malformed id', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const other = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const gaveUp = await quoteThatGaveUp(owner, estimate.id);

    await retry(crewLead, gaveUp.id).expect(403);
    const hidden = await retry(other, gaveUp.id).expect(404);
    expect(hidden.body.code).toBe('NOT_FOUND');
    await retry(owner, 'not-a-uuid').expect(404);
    await retry(owner, randomUUID()).expect(404);
    expect(await stored(gaveUp.id)).toMatchObject({
      status: 'failed',
      attempts: MAX_ATTEMPTS,
      retried_by: null,
    });
  });
});
