// A quote sent to a homeowner, made through the API of a running app with the seeded demo people: the
// same steps as the browser tests' helpers (client/e2e/support/api.ts), for scripts that measure the
// quote page. Answers the link from the e-mail the fake SMTP server caught.

const ESTIMATOR = { email: 'estimator@heronmoss.example', password: 'pond-estimator-2026' };
const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };

async function call(baseUrl, path, token, init = {}) {
  const response = await fetch(`${baseUrl}${path}`, {
    ...init,
    headers: {
      'Content-Type': 'application/json',
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
    },
  });
  if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
  return response.json();
}

async function signIn(baseUrl, person) {
  const body = await call(baseUrl, '/api/auth/login', null, {
    method: 'POST',
    body: JSON.stringify(person),
  });
  return body.accessToken;
}

/** Polls the fake mailbox until the quote e-mail of estimate `number` arrives; answers its link. */
async function quoteLink(mailboxUrl, number, timeoutMs = 20_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const messages = await (await fetch(`${mailboxUrl}/messages`)).json();
    const mail = messages.find((m) => m.subject.includes(`No. ${number})`));
    const link = mail && /(https?:\/\/\S+\/q\/[A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
    if (link) return link;
    await new Promise((resolveWait) => setTimeout(resolveWait, 500));
  }
  throw new Error(`the quote e-mail for estimate ${number} did not arrive within ${timeoutMs} ms`);
}

/**
 * An approved estimate for the demo customer, with a scope and one add-on the homeowner can tick,
 * sent to the homeowner; answers the quote page's URL.
 */
export async function sentQuoteLink({ baseUrl, mailboxUrl, title }) {
  const estimator = await signIn(baseUrl, ESTIMATOR);
  const customers = await call(baseUrl, '/api/customers?q=Thistlewood', estimator);
  const customer = customers.items.find((c) => c.name === 'Bram Thistlewood');
  if (!customer)
    throw new Error('the demo customer Bram Thistlewood is missing: seed the database');
  const created = await call(baseUrl, '/api/estimates', estimator, {
    method: 'POST',
    body: JSON.stringify({ title, customerId: customer.id }),
  });
  const saved = await call(baseUrl, `/api/estimates/${created.id}/draft`, estimator, {
    method: 'PUT',
    body: JSON.stringify({
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
    }),
  });
  let estimate = await call(baseUrl, `/api/estimates/${created.id}/finalise`, estimator, {
    method: 'POST',
    body: JSON.stringify({ revision: saved.draft.revision }),
  });
  const owner = await signIn(baseUrl, OWNER);
  if (estimate.status === 'awaiting_approval') {
    estimate = await call(baseUrl, `/api/estimates/${created.id}/approve`, owner, {
      method: 'POST',
    });
  }
  await call(baseUrl, `/api/estimates/${created.id}/send`, owner, {
    method: 'POST',
    body: JSON.stringify({ recipientEmail: 'bram.homeowner@example.test' }),
  });
  return quoteLink(mailboxUrl, estimate.number);
}
