import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

// The seeded demo people and one of the demo customers (server/src/seed).
const ESTIMATOR = { email: 'estimator@heronmoss.example', password: 'pond-estimator-2026' };
const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };

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

describe('an estimate from a customer call to an approved version', () => {
  it('the estimator builds and finalises it; its discount sends it to the owner, who approves it', async () => {
    const title = `Terrace pond ${Date.now().toString(36)}`;
    const estimator = await (
      await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    ).newPage();
    await signIn(estimator, ESTIMATOR, '/estimates');

    await estimator.getByRole('button', { name: 'New estimate' }).click();
    const dialog = estimator.getByRole('dialog', { name: 'New estimate' });
    await dialog.getByRole('textbox', { name: 'Title' }).fill(title);
    await dialog.getByPlaceholder('Search by name, e-mail or phone').fill('Thistle');
    await estimator.getByRole('option', { name: /Bram Thistlewood/ }).click();
    await dialog.getByRole('button', { name: 'Start the estimate' }).click();

    // The builder: the price from the server, and the drawings from the dimensions.
    await estimator.getByRole('heading', { name: new RegExp(title) }).waitFor();
    await estimator.getByText('Materials').first().waitFor();
    await estimator.getByRole('tab', { name: 'Takeoff' }).click();
    await estimator.getByRole('img', { name: /^Plan view/ }).waitFor();
    await screenshot(estimator, '30-estimate-builder-takeoff');
    await estimator.getByRole('tab', { name: 'Estimate' }).click();

    // A 15 % discount is over the demo policy's ceiling: the version will need the owner.
    const discount = estimator.getByRole('textbox', { name: 'Discount %' });
    await discount.fill('15');
    await estimator.getByRole('button', { name: 'Save draft' }).click();
    await expect.poll(() => estimator.getByText(/revision 2/).count()).toBeGreaterThan(0);
    await screenshot(estimator, '31-estimate-builder-priced');
    await estimator.getByRole('button', { name: 'Finalise' }).click();
    await estimator
      .getByRole('dialog', { name: 'Finalise this estimate?' })
      .getByRole('button', { name: 'Finalise' })
      .click();
    await estimator.getByText('Awaiting approval').first().waitFor();

    // The owner finds it in the queue and approves it.
    const owner = await (
      await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    ).newPage();
    await signIn(owner, OWNER, '/approvals');
    const queue = owner.getByRole('table', { name: 'Estimates waiting for approval' });
    const row = queue.getByRole('row').filter({ hasText: title });
    await row.waitFor();
    expect(await row.textContent()).toMatch(/discount/i);
    await screenshot(owner, '32-approval-queue');
    await row.getByRole('button', { name: /^Approve #/ }).click();
    await owner
      .getByRole('dialog', { name: 'Approve this estimate?' })
      .getByRole('button', { name: 'Approve' })
      .click();
    await row.waitFor({ state: 'detached' });

    await estimator.reload();
    await estimator.getByText('Approved').first().waitFor();
  });
});
