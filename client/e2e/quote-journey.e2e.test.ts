import { PDFParse } from 'pdf-parse';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, approvedEstimateWithAddOn, ESTIMATOR, quoteLinkIn, waitForMail } from './support/api';
import { baseUrl, launchBrowser, screenshot } from './support/browser';

const HOMEOWNER_EMAIL = 'bram.homeowner@example.test';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Waits for the quote e-mail of this estimate to reach the fake SMTP server; answers its text. */
function quoteMail(estimateNumber: number): Promise<string> {
  return waitForMail(
    (m) => m.subject.includes(`No. ${estimateNumber})`) && m.to.includes(HOMEOWNER_EMAIL),
  );
}

const usd = (amount: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(Number(amount));

describe('the homeowner’s quote, from e-mail to deposit', () => {
  it('is sent, opened on a phone, accepted with an option, paid, and shows as accepted and paid', async () => {
    const estimate = await approvedEstimateWithAddOn(`Terrace stream ${Date.now().toString(36)}`);

    // The estimator sends it from the estimate page.
    const staff = await (
      await browser.newContext({ viewport: { width: 1440, height: 1000 } })
    ).newPage();
    await staff.goto(`${baseUrl}/sign-in?next=${encodeURIComponent(`/estimates/${estimate.id}`)}`);
    await staff.getByRole('textbox', { name: 'E-mail' }).fill(ESTIMATOR.email);
    await staff.getByRole('textbox', { name: 'Password' }).fill(ESTIMATOR.password);
    await staff.getByRole('button', { name: 'Sign in' }).click();
    await staff.getByRole('button', { name: 'Send to homeowner' }).click();
    const dialog = staff.getByRole('dialog', { name: 'Send the quote to the homeowner' });
    await dialog.getByRole('textbox', { name: 'Homeowner’s e-mail' }).fill(HOMEOWNER_EMAIL);
    await dialog.getByRole('button', { name: 'Send quote' }).click();
    await staff.getByRole('button', { name: 'Resend', exact: true }).waitFor();

    // The homeowner opens the link from the captured e-mail on a phone.
    const link = quoteLinkIn(await quoteMail(estimate.number));
    const token = link.split('/q/')[1]!;
    const phone = await (
      await browser.newContext({
        viewport: { width: 390, height: 844 },
        deviceScaleFactor: 2,
        isMobile: true,
        hasTouch: true,
      })
    ).newPage();
    await phone.goto(link);
    await phone
      .getByRole('heading', { name: /Terrace stream/ })
      .first()
      .waitFor();
    await screenshot(phone, '40-quote-phone-opened');

    const before = await api<{
      base: { total: string };
      options: Array<{ id: string; label: string }>;
    }>(`/api/quotes/${token}`, null);
    await phone.getByRole('checkbox', { name: /Bubbling urn beside the stream/ }).check();
    await phone.getByRole('textbox', { name: 'Your full name' }).fill('Bram Thistlewood');
    await phone.getByRole('checkbox', { name: /I accept this quote/ }).check();
    await phone.getByRole('button', { name: 'Accept quote' }).click();
    const pay = phone.getByRole('button', { name: /^Pay deposit of/ });
    await pay.waitFor();
    await screenshot(phone, '41-quote-phone-accepted');

    const accepted = await api<{
      acceptance: { total: string; deposit: string; optionIds: string[] };
    }>(`/api/quotes/${token}`, null);
    const urn = before.options.find((o) => o.label === 'Bubbling urn beside the stream')!;
    expect(accepted.acceptance.optionIds).toEqual([urn.id]);
    expect(Number(accepted.acceptance.total)).toBeGreaterThan(Number(before.base.total));

    // The deposit through the provider's (fake) hosted checkout, then back to the quote.
    await pay.click();
    await phone.waitForURL(/\/checkout\//);
    await screenshot(phone, '42-fake-checkout');
    await phone.getByRole('button', { name: /^Pay/ }).click();
    await phone.waitForURL(new RegExp(`/q/${token}\\?payment=success`));
    await phone.getByText('Deposit received').first().waitFor({ timeout: 30_000 });
    await screenshot(phone, '43-quote-phone-paid');

    // The PDF from the link carries the customer's name and the accepted total.
    const pdf = await fetch(`${baseUrl}/api/quotes/${token}/pdf`);
    expect(pdf.headers.get('content-type')).toContain('application/pdf');
    // Text extracted with pdf-parse (pdf.js), a general-purpose PDF reader.
    const parser = new PDFParse({ data: new Uint8Array(await pdf.arrayBuffer()) });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).toContain('Bram Thistlewood');
    expect(text).toContain(usd(accepted.acceptance.total));

    // The estimator sees it accepted with the deposit paid.
    await staff.reload();
    await staff.getByText('Accepted').first().waitFor();
    await staff
      .getByText(/Deposit paid/)
      .first()
      .waitFor();
    await screenshot(staff, '44-estimate-accepted-paid');
  });
});
