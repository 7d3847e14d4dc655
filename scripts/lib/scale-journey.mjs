// The scale-out run's quote journey through the API: an estimate saved on instance 1, sent and
// answered (public quote API) on instance 2, paid through nginx with the provider's webhook going to
// instance 1, and every e-mail counted in the fake mailbox. Also the outbox burst and the reports.
import { randomUUID } from 'node:crypto';
import { psql } from './scale-infra.mjs';

// The seeded demo people (server/src/seed).
export const ESTIMATOR = { email: 'estimator@heronmoss.example', password: 'pond-estimator-2026' };
export const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };

/** A 1×1 PNG: enough for the photo pipeline (sharp re-encodes it as JPEG and WebP). */
const TINY_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);

export const sleep = (ms) => new Promise((resolveSleep) => setTimeout(resolveSleep, ms));

export function check(condition, message) {
  if (!condition) throw new Error(message);
}

/** One HTTP call; throws with the answer unless its status is one of `expect`. */
export async function call(
  base,
  path,
  { method = 'GET', token, json, body, headers = {}, expect = [200, 201], binary = false } = {},
) {
  const response = await fetch(`${base}${path}`, {
    method,
    redirect: 'manual',
    headers: {
      ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}),
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
      ...headers,
    },
    body: json !== undefined ? JSON.stringify(json) : body,
  });
  const bytes = Buffer.from(await response.arrayBuffer());
  if (!expect.includes(response.status)) {
    throw new Error(
      `${method} ${path} on ${base}: HTTP ${response.status} ${bytes.toString('utf8').slice(0, 300)}`,
    );
  }
  const isJson = (response.headers.get('content-type') ?? '').includes('json');
  return {
    status: response.status,
    headers: response.headers,
    upstream: response.headers.get('x-upstream'),
    body: binary ? bytes : isJson ? JSON.parse(bytes.toString('utf8')) : bytes.toString('utf8'),
  };
}

/** Polls `probe` until it answers something truthy, and answers that. */
export async function waitFor(what, probe, { timeoutMs = 20_000, intervalMs = 200 } = {}) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`waited ${timeoutMs / 1000} s for ${what}`);
    await sleep(intervalMs);
  }
}

/** Signs in; answers the access token and the refresh cookie (`pw_refresh=…`). */
export async function signIn(base, person) {
  const response = await call(base, '/api/auth/login', { method: 'POST', json: person });
  const cookie = response.headers
    .getSetCookie()
    .find((header) => header.startsWith('pw_refresh='))
    ?.split(';')[0];
  check(cookie, 'the sign-in set no refresh cookie');
  return { token: response.body.accessToken, cookie };
}

async function mailbox(scale) {
  const response = await fetch(`${scale.fakes.mailboxUrl}/messages`);
  check(response.ok, `the fake mailbox answered HTTP ${response.status}`);
  return response.json();
}

/**
 * After every expected message arrived: waits long enough for both outbox workers to poll many more
 * times, then requires each expected message exactly once and every row sent on its first claim.
 */
async function expectEachDeliveredOnce(scale, expected, outboxSql) {
  await waitFor(
    `${expected.length} e-mails in the fake mailbox`,
    async () => {
      const messages = await mailbox(scale);
      return expected.every((mail) => messages.some(mail.match));
    },
    { timeoutMs: 30_000 },
  );
  await sleep(15 * scale.outboxPollMs);
  const messages = await mailbox(scale);
  for (const mail of expected) {
    const copies = messages.filter(mail.match).length;
    check(copies === 1, `${mail.what}: ${copies} copies in the mailbox, expected exactly 1`);
  }
  const ids = messages.map((message) => message.messageId).filter(Boolean);
  check(new Set(ids).size === ids.length, 'two messages in the mailbox share a Message-ID');
  const rows = psql(scale.primary.port, outboxSql)
    .split('\n')
    .filter(Boolean)
    .map((line) => line.split('|'));
  check(
    rows.length === expected.length,
    `${rows.length} outbox rows for ${expected.length} e-mails`,
  );
  const notOnce = rows.filter(([status, attempts]) => status !== 'sent' || attempts !== '1');
  check(
    notOnce.length === 0,
    `outbox rows not sent on their first claim: ${notOnce.map((row) => row.join(' ')).join(', ')}`,
  );
}

/**
 * The quote journey across both instances. `step` reports each stage; answers what later checks need
 * (the estimate, its job and the estimator's session).
 */
export async function quoteJourney(scale, step, { label }) {
  const [one, two] = scale.instances;
  const lb = scale.nginx.url;
  const tag = `${label}-${Date.now().toString(36)}`;
  const homeowner = `homeowner-${tag}@example.test`;
  const since = psql(scale.primary.port, 'SELECT now()');

  const session = await step(`estimator signs in on ${one.name}`, async (note) => {
    const signedIn = await signIn(one.url, ESTIMATOR);
    note('access token and refresh cookie');
    return signedIn;
  });
  const token = session.token;

  const estimate = await step(`estimate saved and finalised on ${one.name}`, async (note) => {
    const customers = await call(one.url, '/api/customers?q=Thistlewood', { token });
    const customer = customers.body.items.find((c) => c.name === 'Bram Thistlewood');
    check(customer, 'the seeded customer Bram Thistlewood is missing');
    const created = (
      await call(one.url, '/api/estimates', {
        method: 'POST',
        token,
        json: { title: `Scale-out pond ${tag}`, customerId: customer.id },
      })
    ).body;
    const saved = (
      await call(one.url, `/api/estimates/${created.id}/draft`, {
        method: 'PUT',
        token,
        json: {
          ...created.draft.content,
          revision: created.draft.revision,
          scope: 'A lined pond with a stream and a waterfall by the terrace.',
          manualLines: [
            {
              id: 'bubbler',
              category: 'materials',
              description: 'Bubbling urn beside the stream',
              quantity: '1',
              unit: 'ea',
              unitCost: '350.00',
              taxable: true,
              kind: 'add-on',
            },
          ],
        },
      })
    ).body;
    let finalised = (
      await call(one.url, `/api/estimates/${created.id}/finalise`, {
        method: 'POST',
        token,
        json: { revision: saved.draft.revision },
      })
    ).body;
    if (finalised.status === 'awaiting_approval') {
      const owner = await signIn(lb, OWNER);
      finalised = (
        await call(lb, `/api/estimates/${created.id}/approve`, {
          method: 'POST',
          token: owner.token,
        })
      ).body;
      note('approved by the owner through nginx');
    }
    check(finalised.status === 'approved', `the estimate is ${finalised.status}, not approved`);
    note(`No. ${finalised.number}`);
    return finalised;
  });

  await step(`quote sent on ${two.name} with the access token ${one.name} issued`, async (note) => {
    const sent = await call(two.url, `/api/estimates/${estimate.id}/send`, {
      method: 'POST',
      token,
      json: { recipientEmail: homeowner },
    });
    check(
      sent.body.links.some((link) => link.status === 'active'),
      'no active quote link after sending',
    );
    note(`to ${homeowner}`);
  });

  const quoteToken = await step(
    'the quote e-mail arrives; its link is the load balancer’s',
    async (note) => {
      const mail = await waitFor('the quote e-mail', async () =>
        (await mailbox(scale)).find(
          (m) => m.to.includes(homeowner) && m.subject.includes(`(No. ${estimate.number})`),
        ),
      );
      const link = /(https?:\/\/\S+\/q\/[A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
      check(
        link?.startsWith(`${lb}/q/`),
        `the e-mailed link ${link} does not point at nginx (${lb})`,
      );
      note(link.replace(/[A-Za-z0-9_-]{43}$/, '…'));
      return link.split('/q/')[1];
    },
  );

  const acceptance = await step(`homeowner opens and accepts on ${two.name}`, async (note) => {
    const view = (await call(two.url, `/api/quotes/${quoteToken}`)).body;
    const addOn = view.options.find((option) => option.label === 'Bubbling urn beside the stream');
    check(addOn, 'the add-on is not offered on the quote');
    const accepted = (
      await call(two.url, `/api/quotes/${quoteToken}/accept`, {
        method: 'POST',
        json: {
          fullName: 'Bram Thistlewood',
          consent: true,
          optionIds: [addOn.id],
          contentSha256: view.estimate.contentSha256,
        },
      })
    ).body;
    check(accepted.state === 'accepted', `the quote is ${accepted.state} after accepting`);
    note(`total ${accepted.acceptance.total}, deposit ${accepted.acceptance.deposit}`);
    return accepted.acceptance;
  });

  await step(
    `deposit paid through nginx; the provider’s signed webhook reaches ${one.name}`,
    async (note) => {
      const checkout = await call(lb, `/api/quotes/${quoteToken}/checkout`, { method: 'POST' });
      const sessionId = checkout.body.url.split('/checkout/')[1];
      const paid = await fetch(`${checkout.body.url}/pay`, { method: 'POST', redirect: 'manual' });
      check(paid.status === 303, `the fake checkout answered HTTP ${paid.status}`);
      const events = await (await fetch(`${scale.fakes.paymentsUrl}/_fake/events`)).json();
      const event = events.find((candidate) => candidate.event.data.object.id === sessionId);
      check(event, 'the fake provider made no event for the checkout');
      const delivery = event.deliveries.at(-1);
      check(
        delivery?.status === 200,
        `the webhook to ${scale.webhookUrl} answered ${delivery?.status ?? delivery?.error}`,
      );
      note(`checkout via ${checkout.upstream}; webhook ${scale.webhookUrl} → HTTP 200`);
    },
  );

  await step('both instances show the deposit paid', async (note) => {
    for (const instance of [one, two]) {
      const status = (await call(instance.url, `/api/estimates/${estimate.id}/quote`, { token }))
        .body;
      check(
        status.payment?.status === 'paid',
        `${instance.name} shows the payment ${status.payment?.status ?? 'missing'}`,
      );
      check(
        status.payment.amount === acceptance.deposit,
        `${instance.name} shows ${status.payment.amount} paid, the deposit was ${acceptance.deposit}`,
      );
    }
    note(`${acceptance.deposit} recorded once, from the webhook`);
  });

  await step(
    'e-mails (quote sent, two acceptance notices, two receipts): each delivered exactly once',
    async (note) => {
      const number = estimate.number;
      await expectEachDeliveredOnce(
        scale,
        [
          {
            what: 'quote sent',
            match: (m) => m.to.includes(homeowner) && m.subject.includes(`(No. ${number})`),
          },
          {
            what: 'acceptance to the homeowner',
            match: (m) => m.to.includes(homeowner) && m.subject.startsWith('You accepted'),
          },
          {
            what: 'acceptance to the estimator',
            match: (m) =>
              m.to.includes(ESTIMATOR.email) && m.subject.startsWith(`Estimate ${number} accepted`),
          },
          {
            what: 'receipt to the homeowner',
            match: (m) => m.to.includes(homeowner) && m.subject.startsWith('Receipt: deposit'),
          },
          {
            what: 'receipt to the estimator',
            match: (m) =>
              m.to.includes(ESTIMATOR.email) &&
              m.subject.startsWith('Deposit received') &&
              m.subject.endsWith(`estimate ${number}`),
          },
        ],
        `SELECT status, attempts FROM outbox_messages WHERE created_at >= '${since}'`,
      );
      note('5 messages, 5 outbox rows each sent on its first claim');
    },
  );

  const jobId = await step(
    `job made through nginx; a photo uploaded to ${one.name} is read back from ${two.name}`,
    async (note) => {
      const job = (
        await call(lb, '/api/jobs', { method: 'POST', token, json: { estimateId: estimate.id } })
      ).body;
      const photoId = randomUUID();
      const form = new FormData();
      form.append('kind', 'before');
      form.append('photo', new Blob([TINY_PNG], { type: 'image/png' }), 'site.png');
      await call(one.url, `/api/jobs/${job.id}/photos/${photoId}`, {
        method: 'PUT',
        token,
        body: form,
        expect: [201],
      });
      const image = await call(two.url, `/api/jobs/${job.id}/photos/${photoId}/image`, {
        token,
        binary: true,
      });
      check(
        image.headers.get('content-type')?.startsWith('image/jpeg') &&
          image.body[0] === 0xff &&
          image.body[1] === 0xd8,
        `${two.name} did not answer the photo as a JPEG`,
      );
      note(`${image.body.length} bytes of JPEG through the S3 store`);
      return job.id;
    },
  );

  await step(
    `the refresh cookie from ${one.name} renews the session on ${two.name}; its reuse is refused on ${one.name}`,
    async (note) => {
      const renewed = await call(two.url, '/api/auth/refresh', {
        method: 'POST',
        headers: { Cookie: session.cookie },
        expect: [200],
      });
      const me = await call(lb, '/api/auth/me', { token: renewed.body.accessToken });
      check(me.body.email === ESTIMATOR.email, 'the renewed token is not the estimator’s');
      await call(one.url, '/api/auth/refresh', {
        method: 'POST',
        headers: { Cookie: session.cookie },
        expect: [401],
      });
      note('refresh tokens rotate in PostgreSQL');
    },
  );

  return { estimate, acceptance, jobId, session };
}

/**
 * `count` e-mails queued at once (one INSERT, as many transactions' worth of mail arriving together),
 * drained by both instances' outbox workers polling side by side: each must arrive exactly once.
 */
export async function outboxBurst(scale, step, count = 40) {
  await step(
    `${count} e-mails queued at once are each delivered exactly once by the two outbox workers`,
    async (note) => {
      const run = Date.now().toString(36);
      psql(
        scale.primary.port,
        `INSERT INTO outbox_messages (kind, message_id, to_address, subject, text_body)
         SELECT 'scale-burst', '<burst-' || g || '-${run}@pondwright.example>',
                'burst-${run}@example.test', 'Burst ${run} #' || g, 'One of ${count}.'
         FROM generate_series(1, ${count}) AS g`,
      );
      await expectEachDeliveredOnce(
        scale,
        Array.from({ length: count }, (_, index) => ({
          what: `burst e-mail #${index + 1}`,
          match: (m) => m.subject === `Burst ${run} #${index + 1}`,
        })),
        `SELECT status, attempts FROM outbox_messages WHERE kind = 'scale-burst' AND subject LIKE 'Burst ${run} #%'`,
      );
      note(`${count} of ${count}, every row sent on its first claim`);
    },
  );
}

/** The owner's pipeline total (estimates in every status), from the estimate stats report. */
export async function pipelineCount(base, ownerToken) {
  const stats = (await call(base, '/api/estimate-stats', { token: ownerToken })).body;
  return stats.byStatus.reduce((sum, row) => sum + row.count, 0);
}

/** The three reports (estimate stats, the job's cost report, learned rates) answer through nginx. */
export async function readReports(scale, { jobId, ownerToken }) {
  const lb = scale.nginx.url;
  const estimates = await pipelineCount(lb, ownerToken);
  const report = (await call(lb, `/api/jobs/${jobId}/report`, { token: ownerToken })).body;
  check(report.budgetVersion >= 1 && report.totals, 'the job cost report has no budget');
  const rates = (await call(lb, '/api/learned-rates', { token: ownerToken })).body;
  check(Array.isArray(rates) && rates.length > 0, 'no learned rates listed');
  return { estimates, report, rates };
}
