// The fake's hosted checkout page: plain HTML, no script, readable on a phone, and unmistakably a test.
import type { CheckoutLineItem, CheckoutSession } from './checkout-session';

/** Formats an amount in the currency's minor units (cents), e.g. 125000 usd → "$1,250.00". */
export function formatMinorUnits(amount: number, currency: string): string {
  const format = new Intl.NumberFormat('en', {
    style: 'currency',
    currency: currency.toUpperCase(),
  });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(amount / 10 ** digits);
}

export function renderCheckoutPage(
  session: CheckoutSession,
  lineItems: CheckoutLineItem[],
): string {
  const total = formatMinorUnits(session.amount_total, session.currency);
  const items = lineItems
    .map(
      (item) => `
      <li>
        <div>
          <strong>${escapeHtml(item.name)}</strong>${item.quantity > 1 ? ` × ${item.quantity}` : ''}
          ${item.description ? `<p class="muted">${escapeHtml(item.description)}</p>` : ''}
        </div>
        <span>${formatMinorUnits(item.unitAmount * item.quantity, session.currency)}</span>
      </li>`,
    )
    .join('');
  const body =
    session.status === 'complete'
      ? `<p class="done" role="status">Paid ${escapeHtml(total)}. Thank you.</p>
         <p><a class="button" href="${escapeHtml(successUrlFor(session))}">Return to the site</a></p>`
      : `<form method="post" action="/checkout/${encodeURIComponent(session.id)}/pay">
           <button type="submit">Pay ${escapeHtml(total)}</button>
         </form>
         ${session.cancel_url ? `<p class="cancel"><a href="${escapeHtml(session.cancel_url)}">Cancel</a></p>` : ''}`;
  return page(
    'Checkout',
    `<ul class="items">${items}</ul>
     <p class="total"><span>Total</span><strong>${escapeHtml(total)}</strong></p>
     ${session.customer_email ? `<p class="muted">Receipt to ${escapeHtml(session.customer_email)}</p>` : ''}
     ${body}`,
  );
}

export function renderMissingCheckoutPage(): string {
  return page(
    'Checkout not found',
    '<p>This checkout does not exist. Start again from the quote.</p>',
  );
}

/** Where the provider sends the payer afterwards, with the documented session-id placeholder filled. */
export function successUrlFor(session: CheckoutSession): string {
  return session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
}

function page(title: string, content: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)} (test)</title>
<style>${STYLES}</style>
</head>
<body>
<main>
  <p class="test-banner" role="note">Test checkout — no real money moves</p>
  <h1>${escapeHtml(title)}</h1>
  ${content}
</main>
</body>
</html>`;
}

const STYLES = `
  * { box-sizing: border-box; }
  body { margin: 0; background: #f3f4f6; color: #111827; font: 16px/1.5 system-ui, sans-serif; }
  main { max-width: 28rem; margin: 0 auto; padding: 1.5rem 1rem 3rem; }
  h1 { font-size: 1.375rem; margin: 1.25rem 0 1rem; }
  .test-banner { margin: 0; padding: .75rem 1rem; border: 2px dashed #b45309; border-radius: .5rem;
    background: #fffbeb; color: #78350f; font-weight: 600; text-align: center; }
  .items { list-style: none; margin: 0; padding: 0; background: #fff; border-radius: .5rem;
    border: 1px solid #e5e7eb; }
  .items li { display: flex; justify-content: space-between; gap: 1rem; padding: .875rem 1rem; }
  .items li + li { border-top: 1px solid #e5e7eb; }
  .items p { margin: .25rem 0 0; }
  .muted { color: #4b5563; font-size: .9375rem; }
  .total { display: flex; justify-content: space-between; font-size: 1.125rem; margin: 1rem .25rem; }
  button, .button { display: block; width: 100%; min-height: 3rem; padding: .75rem 1rem; border: 0;
    border-radius: .5rem; background: #1f2937; color: #fff; font: inherit; font-weight: 600;
    text-align: center; text-decoration: none; cursor: pointer; }
  button:focus-visible, a:focus-visible { outline: 3px solid #2563eb; outline-offset: 2px; }
  .cancel { text-align: center; margin-top: 1rem; }
  .cancel a { color: #1f2937; }
  .done { padding: .75rem 1rem; background: #ecfdf5; color: #065f46; border-radius: .5rem; }
`;

function escapeHtml(text: string): string {
  return text.replace(
    /[&<>"']/g,
    (char) =>
      ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[char] ?? char,
  );
}
