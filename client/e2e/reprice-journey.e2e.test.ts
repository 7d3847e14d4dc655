import { randomBytes } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

// The seeded demo owner and the demo price book's medium boulders (server/src/seed, shared/src/pricing).
const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };
const MEDIUM_BOULDERS = 'Fieldstone boulders, medium';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

function boulderRow(page: Page) {
  return page.getByRole('row').filter({ hasText: MEDIUM_BOULDERS });
}

async function boulderRowText(page: Page, url: string): Promise<string> {
  if (page.url() !== url) await page.goto(url);
  return (await boulderRow(page).first().textContent()) ?? '';
}

describe('an owner raises the boulder price', () => {
  it('a priced takeoff keeps its old price until it is re-priced on purpose', async () => {
    const page = await (
      await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    ).newPage();
    await page.goto(`${baseUrl}/sign-in?next=%2Ftakeoff`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(OWNER.email);
    await page.getByRole('textbox', { name: 'Password' }).fill(OWNER.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect
      .poll(() => page.getByRole('article', { name: 'Water volume' }).textContent())
      .toContain('gal');

    // Save the example pond as a priced takeoff.
    await page.getByRole('button', { name: 'Save and price' }).click();
    const saveDialog = page.getByRole('dialog', { name: 'Save and price this takeoff' });
    await saveDialog
      .getByRole('textbox', { name: 'Name' })
      .fill(`Lantern Lane pond ${randomBytes(3).toString('hex')}`);
    await saveDialog.getByRole('button', { name: 'Save and price' }).click();
    await saveDialog.getByRole('link', { name: 'Open it' }).click();
    await boulderRow(page).first().waitFor();
    const pricedTakeoffUrl = page.url();

    // The owner raises medium boulders by $25.00 a ton (the demo book starts at $175.00): a new version.
    await page.goto(`${baseUrl}/price-book`);
    const unitCost = page.getByLabel('Unit cost for BOULDER-M');
    const oldCost = Number(await unitCost.inputValue());
    const newCost = oldCost + 25;
    const money = (value: number) => `$${value.toFixed(2)}`;
    await expect.poll(() => boulderRowText(page, pricedTakeoffUrl)).toContain(money(oldCost));
    await page.goto(`${baseUrl}/price-book`);
    await unitCost.fill(newCost.toFixed(2));
    await page
      .getByRole('region', { name: 'Unsaved changes' })
      .getByRole('button', { name: 'Save as new version' })
      .click();
    await page.getByRole('region', { name: 'Unsaved changes' }).waitFor({ state: 'detached' });
    await screenshot(page, '20-price-book-after-raise');

    // The saved takeoff still carries the price it was made with.
    await page.goto(pricedTakeoffUrl);
    await expect.poll(() => boulderRow(page).first().textContent()).toContain(money(oldCost));

    // The preview shows what re-pricing would change; re-pricing adopts the new price.
    await page.getByRole('button', { name: 'See what re-pricing would change' }).click();
    const preview = page.getByRole('dialog', { name: 'What re-pricing would change' });
    const bookChanges = preview.getByRole('table', { name: 'Price-book changes' });
    await expect.poll(() => bookChanges.textContent()).toContain('BOULDER-M');
    expect(await bookChanges.textContent()).toContain(newCost.toFixed(2));
    await screenshot(page, '21-reprice-preview');
    await preview.getByRole('button', { name: 'Re-price with the latest book' }).click();
    await expect.poll(() => boulderRow(page).first().textContent()).toContain(money(newCost));
    await screenshot(page, '22-repriced');
  });
});
