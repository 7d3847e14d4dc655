import { randomBytes } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

// The seeded demo owner (server/src/seed/demo-data.ts); npm test seeds the test database before this runs.
const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
  await page.getByRole('textbox', { name: 'Password' }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('link', { name: 'Home' }).waitFor();
}

async function signOut(page: Page) {
  await page.getByRole('button', { name: /Account menu/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
}

describe('an owner invites an estimator', () => {
  it('the estimator joins, signs in and cannot see the team page', async () => {
    const estimatorEmail = `estimator.${randomBytes(4).toString('hex')}@example.test`;
    const estimatorPassword = 'granite-lily-creek-7';

    const ownerContext = await browser.newContext({ viewport: { width: 1280, height: 860 } });
    const ownerPage = await ownerContext.newPage();
    await signIn(ownerPage, OWNER.email, OWNER.password);
    await screenshot(ownerPage, '01-owner-home');

    await ownerPage.getByRole('link', { name: 'Team' }).click();
    await ownerPage.getByLabel('E-mail').fill(estimatorEmail);
    await ownerPage.getByRole('combobox', { name: 'Role', exact: true }).selectOption('estimator');
    await ownerPage.getByRole('button', { name: 'Send invite' }).click();
    const linkField = ownerPage.getByLabel('Invite link');
    await linkField.waitFor();
    const inviteUrl = await linkField.inputValue();
    expect(inviteUrl).toMatch(/\/accept-invite\/[A-Za-z0-9_-]{43}$/);
    await expect.poll(() => ownerPage.getByText(estimatorEmail).count()).toBeGreaterThan(0);
    await screenshot(ownerPage, '02-owner-team-with-invite');
    await signOut(ownerPage);
    await ownerContext.close();

    // The invitee opens the link in a browser of their own.
    const estimatorContext = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await estimatorContext.newPage();
    await page.goto(inviteUrl);
    await page.getByText('Heronmoss Water Gardens').first().waitFor();
    await page.getByLabel('Your name').fill('Wren Calloway');
    await page.getByRole('textbox', { name: 'Password' }).fill(estimatorPassword);
    await screenshot(page, '03-accept-invite');
    await page.getByRole('button', { name: 'Join team' }).click();
    await page.getByRole('button', { name: 'Account menu for Wren Calloway' }).waitFor();
    await signOut(page);

    await signIn(page, estimatorEmail, estimatorPassword);
    await screenshot(page, '04-estimator-home');
    expect(await page.getByRole('link', { name: 'Team' }).count()).toBe(0);

    // Typing the address is no way round it.
    await page.goto(`${baseUrl}/team`);
    await page.getByText('Not available for your role').waitFor();
    expect(await page.getByRole('button', { name: 'Send invite' }).count()).toBe(0);
    await screenshot(page, '05-estimator-team-refused');
    await estimatorContext.close();
  });
});
