import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  api,
  approvedEstimateWithAddOn,
  CREW_LEAD,
  ESTIMATOR,
  OWNER,
  quoteLinkIn,
  signInApi,
  waitForMail,
} from './support/api';
import { baseUrl, launchBrowser } from './support/browser';

// axe-core (Deque's WCAG rules engine), injected into each page as an inline script: the app's CSP
// refuses inline scripts, so these browser contexts bypass the CSP (axe only reads the page).
const axeSource = readFileSync(
  createRequire(import.meta.url).resolve('axe-core/axe.min.js'),
  'utf8',
);

type AxeViolation = {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[]; failureSummary?: string }>;
};

let browser: Browser;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  for (const context of contexts) await context.close();
  await browser?.close();
});

async function newPage(viewport = { width: 1280, height: 900 }): Promise<Page> {
  const context = await browser.newContext({ viewport, bypassCSP: true });
  contexts.push(context);
  return context.newPage();
}

async function signIn(page: Page, person: { email: string; password: string }) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(person.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** Opens a page of the app and waits until its heading is shown and its data has arrived. */
async function visit(page: Page, path: string, heading: string | RegExp) {
  await page.goto(`${baseUrl}${path}`);
  await page.getByRole('heading', { level: 1, name: heading }).first().waitFor();
  await page.waitForLoadState('networkidle');
  // Skeletons and loaders give way to the data; transitions finish.
  await page
    .locator('.mantine-Skeleton-root, .mantine-Loader-root')
    .first()
    .waitFor({ state: 'detached', timeout: 10_000 })
    .catch(() => undefined);
  await page.waitForTimeout(300);
}

/** The serious and critical WCAG problems axe finds on the page as it is now. */
async function seriousViolations(page: Page): Promise<AxeViolation[]> {
  await page.addScriptTag({ content: axeSource });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (...args: unknown[]) => Promise<unknown> } })
      .axe;
    const results = (await axe.run(document, { resultTypes: ['violations'] })) as {
      violations: AxeViolation[];
    };
    return results.violations;
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

function describeViolations(violations: AxeViolation[]): string {
  return violations
    .map(
      (v) =>
        `${v.id} (${v.impact}): ${v.help}\n` +
        v.nodes
          .slice(0, 8)
          .map(
            (node) =>
              `    ${node.target.join(' ')}: ${node.failureSummary?.split('\n').at(-1)?.trim() ?? ''}`,
          )
          .join('\n'),
    )
    .join('\n');
}

/** Visits each page in turn; fails once at the end with every page's violations. */
async function expectPagesAccessible(page: Page, pages: Array<[string, string, string | RegExp]>) {
  const failures: string[] = [];
  for (const [name, path, heading] of pages) {
    await visit(page, path, heading);
    const violations = await seriousViolations(page);
    if (violations.length > 0)
      failures.push(`${name} (${path}):\n${describeViolations(violations)}`);
  }
  expect(failures.join('\n\n'), 'serious or critical axe violations').toBe('');
}

async function expectAccessible(page: Page, name: string) {
  const violations = await seriousViolations(page);
  expect(describeViolations(violations), `${name} (${page.url()})`).toBe('');
}

type Ids = { estimateId: string; customerId: string; jobId: string };
let ids: Ids;

beforeAll(async () => {
  const owner = await signInApi(OWNER);
  const estimates = await api<{ items: Array<{ id: string; title: string }> }>(
    '/api/estimates?q=Kitchen-view',
    owner,
  );
  const customers = await api<{ items: Array<{ id: string; name: string }> }>(
    '/api/customers?q=Thistlewood',
    owner,
  );
  const jobs = await api<Array<{ id: string; title: string }>>('/api/jobs', owner);
  ids = {
    estimateId: estimates.items[0]!.id,
    customerId: customers.items[0]!.id,
    jobId: jobs.find((job) => job.title === 'Terrace pond and stream')?.id ?? jobs[0]!.id,
  };
});

describe('every main page passes axe-core without serious or critical violations', () => {
  it('the sign-in page', async () => {
    const page = await newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await expectAccessible(page, 'sign-in');
  });

  // Sixteen pages, each loaded and audited: longer than one journey's default time.
  it('the owner’s pages', async () => {
    const page = await newPage();
    await signIn(page, OWNER);
    const pages: Array<[string, string, string | RegExp]> = [
      ['dashboard', '/', /.+/],
      ['estimates', '/estimates', 'Estimates'],
      ['one estimate', `/estimates/${ids.estimateId}`, /Kitchen-view pond/],
      ['customers', '/customers', 'Customers'],
      ['one customer', `/customers/${ids.customerId}`, /Thistlewood/],
      ['price book', '/price-book', 'Price book'],
      ['learned rates', '/price-book/learned-rates', 'Crew rates'],
      ['takeoff', '/takeoff', 'Takeoff'],
      ['priced takeoffs', '/priced-takeoffs', 'Priced takeoffs'],
      ['jobs', '/jobs', 'Jobs'],
      ['schedule', '/jobs/schedule', 'Schedule'],
      ['one job', `/jobs/${ids.jobId}`, /Terrace pond and stream/],
      ['team', '/team', 'Team'],
      ['company', '/company', 'Company'],
      ['approvals', '/approvals', 'Approvals'],
      ['dev mailbox', '/dev/mailbox', 'Mailbox (dev)'],
    ];
    await expectPagesAccessible(page, pages);
  }, 300_000);

  it('the estimator’s home page', async () => {
    const page = await newPage();
    await signIn(page, ESTIMATOR);
    await visit(page, '/', /.+/);
    await expectAccessible(page, 'estimator home');
  });

  it('the crew lead’s pages, on a phone', async () => {
    const page = await newPage({ width: 390, height: 844 });
    await signIn(page, CREW_LEAD);
    const pages: Array<[string, string, string | RegExp]> = [
      ['crew home', '/', /.+/],
      ['my jobs', '/my-jobs', 'My jobs'],
      ['the job’s log', `/jobs/${ids.jobId}/log`, /.+/],
    ];
    await expectPagesAccessible(page, pages);
  });

  it('the homeowner’s quote page, on a phone', async () => {
    // A quote open for the homeowner, with an option to tick.
    const estimate = await approvedEstimateWithAddOn(`Accessible quote ${Date.now().toString(36)}`);
    await api(`/api/estimates/${estimate.id}/send`, await signInApi(OWNER), {
      method: 'POST',
      body: JSON.stringify({ recipientEmail: 'bram.homeowner@example.test' }),
    });
    const link = quoteLinkIn(
      await waitForMail((m) => m.subject.includes(`No. ${estimate.number})`)),
    );
    const page = await newPage({ width: 390, height: 844 });
    await page.goto(link);
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await page.waitForLoadState('networkidle');
    await expectAccessible(page, 'quote page');
  });
});
