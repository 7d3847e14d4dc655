// A local SMTP server that delivers nowhere: every message is kept in memory and listed over HTTP, so
// developers and browser tests can read the mail the app sends. Never for production use.
import { randomBytes } from 'node:crypto';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { MailboxMessage } from '@pondwright/shared';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import {
  assertLoopback,
  closeHttpServer,
  handleRequests,
  listenOn,
  sendJson,
  sendText,
} from './loopback-http';
import { parseMail } from './mime-parser';

/** The mailbox forgets the oldest message beyond this, so a long session cannot grow without bound. */
export const MAILBOX_CAPACITY = 500;
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

/** A listed message, with its Message-ID header for tests that match on it. */
export type CapturedMessage = MailboxMessage & { messageId: string | null };

export type FakeSmtpOptions = { smtpPort: number; httpPort: number; host?: string };

export type FakeSmtp = {
  smtpPort: number;
  httpPort: number;
  /** Newest first. */
  messages(): CapturedMessage[];
  clear(): void;
  stop(): Promise<void>;
};

type StoredMessage = { listed: CapturedMessage; raw: Buffer };

export async function startFakeSmtp({
  smtpPort,
  httpPort,
  host = '127.0.0.1',
}: FakeSmtpOptions): Promise<FakeSmtp> {
  assertLoopback(host);
  let stored: StoredMessage[] = [];
  const store = (raw: Buffer, session: SMTPServerSession) => {
    stored.unshift({ listed: toListedMessage(raw, session), raw });
    stored.length = Math.min(stored.length, MAILBOX_CAPACITY);
  };

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    // Stopping should not wait out a pooled client's idle connection.
    closeTimeout: 500,
    // Any credentials are accepted, so an app configured with SMTP_USER still sends here.
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'anyone' }),
    onData: (stream, session, callback) => {
      readMessage(stream).then(
        (raw) => {
          store(raw, session);
          callback();
        },
        (error: Error) => callback(error),
      );
    },
  });
  smtp.on('error', () => {
    // A client dropping its connection mid-session is no reason to stop the fake.
  });

  const routeMailbox = async (request: IncomingMessage, response: ServerResponse) => {
    const path = new URL(request.url ?? '/', 'http://mailbox').pathname;
    const rawMatch = /^\/messages\/([^/]+)\/raw$/.exec(path);
    if (request.method === 'GET' && path === '/messages') {
      sendJson(
        response,
        200,
        stored.map((message) => message.listed),
      );
    } else if (request.method === 'DELETE' && path === '/messages') {
      stored = [];
      response.writeHead(204).end();
    } else if (request.method === 'GET' && rawMatch) {
      const found = stored.find((message) => message.listed.id === rawMatch[1]);
      if (found) sendText(response, 200, found.raw);
      else sendJson(response, 404, { error: { message: 'No such message' } });
    } else {
      sendJson(response, 404, {
        error: { message: 'Routes: GET /messages, GET /messages/:id/raw, DELETE /messages' },
      });
    }
  };

  const http = createServer(handleRequests(routeMailbox));

  const boundSmtpPort = await listenOn(smtp.server, smtpPort, host);
  let boundHttpPort: number;
  try {
    boundHttpPort = await listenOn(http, httpPort, host);
  } catch (error) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    throw error;
  }

  return {
    smtpPort: boundSmtpPort,
    httpPort: boundHttpPort,
    messages: () => stored.map((message) => message.listed),
    clear: () => {
      stored = [];
    },
    stop: async () => {
      await Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        closeHttpServer(http),
      ]);
    },
  };
}

function readMessage(stream: SMTPServerDataStream): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('error', reject);
    stream.on('end', () => {
      if (stream.sizeExceeded) reject(new Error(`message over ${MAX_MESSAGE_BYTES} bytes`));
      else resolve(Buffer.concat(chunks));
    });
  });
}

function toListedMessage(raw: Buffer, session: SMTPServerSession): CapturedMessage {
  const parsed = parseMail(raw);
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
  return {
    id: randomBytes(8).toString('hex'),
    receivedAt: new Date().toISOString(),
    from: parsed.from || envelopeFrom,
    // A message without a To header (Bcc only) is still shown to whom it went.
    to: parsed.to.length > 0 ? parsed.to : session.envelope.rcptTo.map((rcpt) => rcpt.address),
    subject: parsed.subject,
    text: parsed.text,
    html: parsed.html,
    attachments: parsed.attachments,
    messageId: parsed.messageId,
  };
}
