import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, CREW_LEAD, OWNER, signInApi } from './support/api';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

type ApiJob = { id: string; number: number; crewName: string | null };
type ApiJobDetail = {
  logs: Array<{ id: string; logDate: string; entries: Array<{ kind: string; hours?: string }> }>;
};

// A day of its own, so a rerun against the same database finds it empty.
const DAY = `2027-02-${String(10 + (Date.now() % 15)).padStart(2, '0')}`;

async function signIn(page: Page, next: string) {
  await page.goto(`${baseUrl}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(CREW_LEAD.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(CREW_LEAD.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

function phoneContext(): Promise<BrowserContext> {
  return browser.newContext({
    viewport: { width: 390, height: 844 },
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
  });
}

describe('the daily log in a backyard with no signal', () => {
  it('opens with no connection, keeps the day on the phone, and sends it once when the signal returns', async () => {
    // The demo job under way, led by the demo crew lead (server/src/seed/seed-demo-job.ts).
    const crewToken = await signInApi(CREW_LEAD);
    const jobs = await api<ApiJob[]>('/api/jobs?status=in_progress', crewToken);
    const job = jobs
      .filter((candidate) => candidate.crewName === 'Reedbank crew')
      .sort((a, b) => a.number - b.number)[0]!;
    const logPath = `/jobs/${job.id}/log/${DAY}`;

    // One visit with signal: the service worker keeps the app, the log keeps a copy of the job.
    const context = await phoneContext();
    const page = await context.newPage();
    await signIn(page, logPath);
    await page.getByRole('button', { name: 'Add hours' }).waitFor();
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });

    // No signal, and the page is opened again from scratch.
    await context.setOffline(true);
    await page.reload();
    await page
      .getByRole('status', { name: 'No connection: opened from this device' })
      .waitFor();
    await page.getByRole('button', { name: 'Add hours' }).click();
    const row = page.getByRole('group', { name: 'Hours 1' });
    await row.getByLabel('Person').fill('Tobin Marsh');
    await row.getByLabel('Task').selectOption('rockPlacing');
    await row.getByLabel('Hours', { exact: true }).fill('5.5');
    await page.getByRole('textbox', { name: 'Notes' }).fill('Logged with no signal.');
    await page.getByRole('button', { name: 'Save the day’s log' }).click();
    await page.getByRole('status', { name: 'Log status' }).getByText('Waiting to send').waitFor();
    await screenshot(page, '53-crew-log-offline');

    // The signal returns: the session is restored from the refresh cookie and the log goes up.
    await context.setOffline(false);
    await page
      .getByRole('status', { name: 'No connection: opened from this device' })
      .waitFor({ state: 'detached', timeout: 45_000 });
    await page
      .getByRole('status', { name: 'Log status' })
      .getByText('Saved')
      .waitFor({ timeout: 30_000 });

    const detail = await api<ApiJobDetail>(`/api/jobs/${job.id}`, await signInApi(OWNER));
    const logged = detail.logs.filter((log) => log.logDate === DAY);
    expect(logged).toHaveLength(1);
    expect(logged[0]!.entries).toEqual([
      expect.objectContaining({ kind: 'hours', hours: '5.5' }),
    ]);
    await context.close();
  });
});
