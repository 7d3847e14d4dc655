import nodemailer from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { type CapturedMessage, type FakeSmtp, MAILBOX_CAPACITY, startFakeSmtp } from './fake-smtp';

describe('fake SMTP server', () => {
  let fake: FakeSmtp;
  let mailboxUrl: string;

  const transport = () =>
    nodemailer.createTransport({ host: '127.0.0.1', port: fake.smtpPort, secure: false });
  const listMessages = async (): Promise<CapturedMessage[]> =>
    (await fetch(`${mailboxUrl}/messages`)).json() as Promise<CapturedMessage[]>;

  beforeAll(async () => {
    fake = await startFakeSmtp({ smtpPort: 0, httpPort: 0 });
    mailboxUrl = `http://127.0.0.1:${fake.httpPort}`;
  });
  afterAll(() => fake.stop());
  beforeEach(() => fake.clear());

  it('picks free ports when asked for port 0', () => {
    expect(fake.smtpPort).toBeGreaterThan(0);
    expect(fake.httpPort).toBeGreaterThan(0);
    expect(fake.httpPort).not.toBe(fake.smtpPort);
  });

  it('captures real mail and lists it over HTTP', async () => {
    const pdf = Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(20_000, 7)]);
    const sent = await transport().sendMail({
      from: 'Pondwright <no-reply@pondwright.example>',
      to: 'Jane Doe <jane@example.com>',
      subject: 'Quote № 12 — Façade pond',
      text: 'Your quote is ready: https://app.example/q/abc',
      html: '<p>Your quote is <a href="https://app.example/q/abc">ready</a>.</p>',
      attachments: [{ filename: 'quote-12.pdf', content: pdf, contentType: 'application/pdf' }],
    });

    const [message, ...others] = await listMessages();

    expect(others).toEqual([]);
    expect(message).toMatchObject({
      from: 'Pondwright <no-reply@pondwright.example>',
      to: ['jane@example.com'],
      subject: 'Quote № 12 — Façade pond',
      text: 'Your quote is ready: https://app.example/q/abc',
      html: '<p>Your quote is <a href="https://app.example/q/abc">ready</a>.</p>',
      attachments: [{ filename: 'quote-12.pdf', contentType: 'application/pdf', size: pdf.length }],
      messageId: sent.messageId,
    });
    expect(message?.id).toMatch(/^[0-9a-f]{16}$/);
    expect(Date.parse(message?.receivedAt ?? '')).not.toBeNaN();

    const raw = await fetch(`${mailboxUrl}/messages/${message?.id}/raw`);
    expect(raw.status).toBe(200);
    const rawText = await raw.text();
    expect(rawText).toMatch(/^Subject: =\?UTF-8\?/m);
    expect(rawText).toContain(`Message-ID: ${sent.messageId}`);
  });

  it('lists newest first, empties on DELETE and answers 404 for an unknown message', async () => {
    const mailer = transport();
    await mailer.sendMail({
      from: 'a@example.com',
      to: 'b@example.com',
      subject: 'first',
      text: '1',
    });
    await mailer.sendMail({
      from: 'a@example.com',
      to: 'b@example.com',
      subject: 'second',
      text: '2',
    });
    expect((await listMessages()).map((message) => message.subject)).toEqual(['second', 'first']);

    const deleted = await fetch(`${mailboxUrl}/messages`, { method: 'DELETE' });
    expect(deleted.status).toBe(204);
    expect(await listMessages()).toEqual([]);
    expect((await fetch(`${mailboxUrl}/messages/nope/raw`)).status).toBe(404);
  });

  it('shows envelope recipients when there is no To header', async () => {
    await transport().sendMail({ from: 'a@example.com', bcc: 'hidden@example.com', text: 'x' });
    expect((await listMessages())[0]?.to).toEqual(['hidden@example.com']);
  });

  it(`keeps at most ${MAILBOX_CAPACITY} messages, forgetting the oldest`, async () => {
    const mailer = nodemailer.createTransport({
      host: '127.0.0.1',
      port: fake.smtpPort,
      pool: true,
      maxConnections: 5,
      maxMessages: Infinity,
    });
    const send = (subject: string) =>
      mailer.sendMail({ from: 'a@example.com', to: 'b@example.com', subject, text: '.' });
    await send('oldest');
    await Promise.all(Array.from({ length: MAILBOX_CAPACITY }, (_, index) => send(`m${index}`)));
    mailer.close();

    const subjects = fake.messages().map((message) => message.subject);
    expect(subjects).toHaveLength(MAILBOX_CAPACITY);
    expect(subjects).not.toContain('oldest');
  });

  it('refuses to listen beyond loopback', async () => {
    await expect(startFakeSmtp({ smtpPort: 0, httpPort: 0, host: '0.0.0.0' })).rejects.toThrow(
      /loopback only/,
    );
  });
});
