import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  api,
  approvedEstimateWithAddOn,
  CREW_LEAD,
  OWNER,
  quoteLinkIn,
  signInApi,
  waitForMail,
} from './support/api';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signIn(page: Page, person: { email: string; password: string }, next: string) {
  await page.goto(`${baseUrl}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(person.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(person.password);
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

/** An estimate the homeowner accepted (through the API: the quote journey accepts one by hand). */
async function acceptedEstimate(title: string) {
  const estimate = await approvedEstimateWithAddOn(title);
  const owner = await signInApi(OWNER);
  await api(`/api/estimates/${estimate.id}/send`, owner, {
    method: 'POST',
    body: JSON.stringify({ recipientEmail: 'bram.homeowner@example.test' }),
  });
  const link = quoteLinkIn(await waitForMail((m) => m.subject.includes(`No. ${estimate.number})`)));
  const token = link.split('/q/')[1]!;
  const quote = await api<{ estimate: { contentSha256: string } }>(`/api/quotes/${token}`, null);
  await api(`/api/quotes/${token}/accept`, null, {
    method: 'POST',
    body: JSON.stringify({
      fullName: 'Bram Thistlewood',
      consent: true,
      optionIds: [],
      contentSha256: quote.estimate.contentSha256,
    }),
  });
  return estimate;
}

/** A JPEG drawn by the browser itself, so the test needs no image files. */
async function photoFrom(page: Page, colour: string): Promise<Buffer> {
  const dataUrl = await page.evaluate((fill) => {
    const canvas = document.createElement('canvas');
    canvas.width = 640;
    canvas.height = 480;
    const context = canvas.getContext('2d')!;
    context.fillStyle = fill;
    context.fillRect(0, 0, 640, 480);
    return canvas.toDataURL('image/jpeg', 0.8);
  }, colour);
  return Buffer.from(dataUrl.split(',')[1]!, 'base64');
}

/**
 * A day's log on the phone with a photo of the work: the photo waits on the phone (IndexedDB) until the
 * log is saved, then goes up by itself; the test waits until the server has it.
 */
async function logDay(page: Page, jobId: string, date: string, hours: string, photoColour: string) {
  await page.goto(`${baseUrl}/jobs/${jobId}/log/${date}`);
  await page.getByRole('button', { name: 'Add hours' }).click();
  const row = page.getByRole('group', { name: 'Hours 1' });
  await row.getByLabel('Person').fill('Marisol Fenwick');
  await row.getByLabel('Task').selectOption('rockPlacing');
  await row.getByLabel('Hours', { exact: true }).fill(hours);
  await page.getByRole('textbox', { name: 'Notes' }).fill(`Boulders placed on ${date}.`);
  await page.getByLabel('Photos from this phone').setInputFiles({
    name: `day-${date}.jpg`,
    mimeType: 'image/jpeg',
    buffer: await photoFrom(page, photoColour),
  });
  await page.getByRole('button', { name: 'Save the day’s log' }).click();
  await page.getByText('The day’s log is saved.').waitFor();
}

async function photoCount(jobId: string): Promise<number> {
  return (await api<unknown[]>(`/api/jobs/${jobId}/photos`, await signInApi(OWNER))).length;
}

describe('a job from acceptance to close-out', () => {
  it('is logged from a phone, changed with the homeowner’s consent, closed and costed', async () => {
    const title = `Terrace falls ${Date.now().toString(36)}`;
    const estimate = await acceptedEstimate(title);

    // The owner makes the job from the accepted estimate.
    const office = await (
      await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    ).newPage();
    await signIn(office, OWNER, `/estimates/${estimate.id}`);
    await office.getByRole('button', { name: 'Make it a job' }).click();
    await office
      .getByRole('dialog', { name: 'Make it a job' })
      .getByRole('button', { name: 'Make the job' })
      .click();
    await office.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
    const jobId = office.url().split('/jobs/')[1]!;

    // The crew lead logs two days with a photo each, on a phone.
    const phone = await (await phoneContext()).newPage();
    await signIn(phone, CREW_LEAD, `/jobs/${jobId}`);
    await phone.getByRole('tab', { name: 'Photos' }).waitFor();
    await logDay(phone, jobId, '2027-03-15', '6', '#3f7a5a');
    await expect.poll(() => photoCount(jobId), { timeout: 30_000 }).toBe(1);
    await logDay(phone, jobId, '2027-03-16', '7.5', '#8a6d3b');
    await expect.poll(() => photoCount(jobId), { timeout: 30_000 }).toBe(2);
    await screenshot(phone, '50-crew-log-phone');

    // A change order, sent to the homeowner and accepted from the link in the e-mail.
    await office.reload();
    await office.getByRole('tab', { name: 'Change orders' }).click();
    await office.getByRole('button', { name: 'New change order' }).click();
    const change = office.getByRole('dialog', { name: /change order/i });
    await change.getByRole('textbox', { name: 'Title' }).fill('Retaining wall behind the falls');
    await change.getByRole('button', { name: 'Add a line' }).click();
    await change
      .getByRole('textbox', { name: 'Description of line 1' })
      .fill('Dry-stone retaining wall');
    await change.getByRole('textbox', { name: 'Quantity of line 1' }).fill('12');
    await change.getByRole('textbox', { name: 'Unit of line 1' }).fill('ft');
    await change.getByRole('textbox', { name: 'Unit cost of line 1' }).fill('45');
    await change.getByRole('button', { name: 'Price the change' }).click();
    await office
      .getByRole('dialog', { name: 'The change is priced' })
      .getByRole('button', { name: 'Send to homeowner' })
      .click();
    const send = office
      .getByRole('dialog')
      .filter({ has: office.getByRole('textbox', { name: 'Homeowner’s e-mail' }) });
    await send.getByRole('button', { name: 'Send to homeowner' }).click();
    const changeLink = quoteLinkIn(
      await waitForMail((m) => m.subject.startsWith('Change order 1') && m.subject.includes(title)),
    );
    const homeowner = await (await phoneContext()).newPage();
    await homeowner.goto(changeLink);
    await homeowner.getByRole('textbox', { name: 'Your full name' }).fill('Bram Thistlewood');
    await homeowner.getByRole('checkbox', { name: /I agree to this change/ }).check();
    await homeowner.getByRole('button', { name: 'Accept change' }).click();
    await homeowner
      .getByText(/Change accepted/)
      .first()
      .waitFor();
    await screenshot(homeowner, '51-change-order-accepted');

    // Close-out: started, completed and closed by the owner.
    await office.reload();
    for (const step of ['Start job', 'Mark complete', 'Close job']) {
      await office.getByRole('button', { name: step }).first().click();
      await office.getByRole('dialog').getByRole('button', { name: step }).click();
      await office.getByRole('dialog').waitFor({ state: 'detached' });
    }

    // The report: the hours logged, costed at the quoted rate, and the change in the budget.
    const owner = await signInApi(OWNER);
    const report = await api<{
      labor: Array<{ task: string | null; actualHours: string }>;
      totals: { actualCost: string; quotedPriceBeforeTax: string };
    }>(`/api/jobs/${jobId}/report`, owner);
    const rock = report.labor.find((row) => row.task === 'rockPlacing')!;
    expect(Number(rock.actualHours)).toBe(13.5); // 6 + 7.5 h logged
    const job = await api<{ status: string; budget: { lines: Array<{ description: string }> } }>(
      `/api/jobs/${jobId}`,
      owner,
    );
    expect(job.status).toBe('closed');
    expect(job.budget.lines.map((l) => l.description)).toContain('Dry-stone retaining wall');
    const photos = await api<Array<{ logId: string | null }>>(`/api/jobs/${jobId}/photos`, owner);
    expect(photos.every((photo) => photo.logId !== null)).toBe(true);

    await office.getByRole('tab', { name: 'Cost report' }).click();
    await office.getByText('Realised margin').first().waitFor();
    await office.getByText('13.5', { exact: false }).first().waitFor();
    await screenshot(office, '52-job-cost-report');
  });
});
