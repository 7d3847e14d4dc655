import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

// The seeded demo estimator (server/src/seed/demo-data.ts).
const ESTIMATOR = { email: 'estimator@heronmoss.example', password: 'pond-estimator-2026' };

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('an estimator takes off a pond', () => {
  it('sees the volume at once, deepens the pond, and the server agrees with the browser', async () => {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await page.goto(`${baseUrl}/sign-in?next=%2Ftakeoff`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(ESTIMATOR.email);
    await page.getByRole('textbox', { name: 'Password' }).fill(ESTIMATOR.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    const volume = page.getByRole('article', { name: 'Water volume' });
    // The engine's example pond, 15 × 10 × 2 ft with one shelf, less its rock and gravel.
    await expect.poll(() => volume.textContent()).toContain('1,326 gal');

    const basin = page.getByRole('group', { name: /^Basin 1/ });
    const depth = basin.getByRole('textbox', { name: 'Max depth (ft)' });
    await depth.fill('3');
    // A deeper pond holds more water.
    await expect
      .poll(async () =>
        Number((await volume.textContent())?.match(/([\d,]+) gal/)?.[1]?.replace(/,/g, '')),
      )
      .toBeGreaterThan(1326);

    await page.getByRole('button', { name: 'Check on server' }).click();
    await page.getByText('The server agrees').waitFor();
    await screenshot(page, '10-takeoff-server-agrees');
    await context.close();
  });
});
