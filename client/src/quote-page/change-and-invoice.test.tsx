import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { json, mockApi } from '@/testing/mock-api';
import { browser } from './lib/browser';
import {
  CHANGE_SHA256,
  changeOrderQuoteView,
  invoiceQuoteView,
  QUOTE_PATH,
  QUOTE_TOKEN,
} from './testing/quote-view';
import { renderQuotePage } from './testing/render-quote-page';

const GET = `GET /api/quotes/${QUOTE_TOKEN}`;
const ACCEPT = `POST /api/quotes/${QUOTE_TOKEN}/accept`;
const DECLINE = `POST /api/quotes/${QUOTE_TOKEN}/decline`;
const CHECKOUT = `POST /api/quotes/${QUOTE_TOKEN}/checkout`;

/** True when `a` comes before `b` in the page. */
const precedes = (a: Node, b: Node) =>
  Boolean(a.compareDocumentPosition(b) & Node.DOCUMENT_POSITION_FOLLOWING);

describe('The quote page for a change order', () => {
  it('leads with the change: its reason, lines, what it adds and the job before → after', async () => {
    mockApi({ [GET]: json(changeOrderQuoteView()) });
    renderQuotePage();

    const change = await screen.findByRole('region', { name: 'Change to your project' });
    expect(
      within(change).getByRole('heading', { name: 'Bog filter and a longer planting shelf' }),
    ).toBeInTheDocument();
    expect(within(change).getByText('Change 2')).toBeInTheDocument();
    expect(within(change).getByText(/the plants clean the water/)).toBeInTheDocument();

    const lines = within(change).getByRole('table', { name: 'What the change adds' });
    const rows = within(lines).getAllByRole('row');
    expect(rows).toHaveLength(3);
    expect(rows[1]).toHaveTextContent('Bog filter bed with gravel and plants1 ea$1,450.00');
    expect(rows[2]).toHaveTextContent('Planting shelf, extended6 ft$330.00');

    // 1,450.00 + 330.00 = 1,780.00; tax 61.19; 1,841.19 in all; the job 13,292.25 → 15,133.44.
    expect(screen.getByTestId('change-before-tax')).toHaveTextContent('$1,780.00');
    expect(screen.getByTestId('change-tax')).toHaveTextContent('$61.19');
    expect(screen.getByTestId('change-total')).toHaveTextContent('$1,841.19');
    expect(screen.getByTestId('change-job-total')).toHaveTextContent(
      '$13,292.25 → becomes $15,133.44',
    );

    // The project's details follow, describing the whole job with the change.
    const feature = screen.getByRole('region', { name: 'Your water feature' });
    expect(precedes(change, feature)).toBe(true);
    const price = screen.getByRole('region', { name: 'Project price with this change' });
    expect(within(price).getByText('$14,253.69')).toBeInTheDocument();
    expect(screen.getByText('Change 2 · quote 1042')).toBeInTheDocument();

    // No options to tick, no live total, no deposit or payment schedule: the change's total instead.
    expect(screen.queryByRole('checkbox', { name: /Underwater LED lighting/ })).toBeNull();
    expect(screen.queryByTestId('live-total')).toBeNull();
    expect(screen.queryByRole('region', { name: 'Payment schedule' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Pay deposit/ })).toBeNull();
    expect(screen.queryByText('Deposit received')).toBeNull();
    const form = screen.getByRole('form', { name: 'Accept this change' });
    expect(form).toHaveTextContent(
      'This change adds $1,841.19, tax included, and brings your project to $15,133.44.',
    );
    expect(screen.getByRole('button', { name: 'Accept change' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Accept quote' })).toBeNull();
    expect(document.title).toBe('Change 2 to quote 1042 from Stillwater Ponds & Gardens');
  });

  it('accepts the change with the name, the consent, no options and the change’s version', async () => {
    const server = mockApi({
      [GET]: json(changeOrderQuoteView()),
      [ACCEPT]: json(changeOrderQuoteView('accepted')),
    });
    const { user } = renderQuotePage();
    await user.type(
      await screen.findByRole('textbox', { name: /Your full name/ }),
      ' Bram Thistlewood ',
    );
    await user.click(
      screen.getByRole('checkbox', {
        name: 'I agree to this change and its price, on the terms of my quote',
      }),
    );
    await user.click(screen.getByRole('button', { name: 'Accept change' }));

    const heading = await screen.findByRole('heading', { name: /^Change accepted on / });
    expect(server.callsTo(ACCEPT)).toHaveLength(1);
    expect(server.callsTo(ACCEPT)[0]!.body).toEqual({
      fullName: 'Bram Thistlewood',
      consent: true,
      optionIds: [],
      contentSha256: CHANGE_SHA256,
    });
    await waitFor(() => expect(heading).toHaveFocus());
    expect(screen.getByRole('region', { name: 'Change accepted' })).toHaveTextContent(
      'Your project total is now $15,133.44',
    );
    expect(screen.queryByRole('button', { name: 'Accept change' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline' })).toBeNull();
  });

  it('asks for the consent in the change’s own words before sending anything', async () => {
    const server = mockApi({ [GET]: json(changeOrderQuoteView()) });
    const { user } = renderQuotePage();
    await user.type(await screen.findByRole('textbox', { name: /Your full name/ }), 'Bram');
    await user.click(screen.getByRole('button', { name: 'Accept change' }));
    expect(screen.getByText('Tick the box to agree to the change')).toBeInTheDocument();
    expect(server.callsTo(ACCEPT)).toHaveLength(0);
  });

  it('declines the change with an optional reason', async () => {
    const server = mockApi({
      [GET]: json(changeOrderQuoteView()),
      [DECLINE]: json(changeOrderQuoteView('declined')),
    });
    const { user } = renderQuotePage();
    expect(await screen.findByText('Rather not make this change?')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Decline' }));
    await user.type(
      screen.getByRole('textbox', { name: /Would you like to say why/ }),
      'We would rather keep the lawn.',
    );
    await user.click(screen.getByRole('button', { name: 'Decline change' }));

    const heading = await screen.findByRole('heading', { name: 'Change declined' });
    expect(server.callsTo(DECLINE)[0]!.body).toEqual({ reason: 'We would rather keep the lawn.' });
    await waitFor(() => expect(heading).toHaveFocus());
    // Declined: the job stays as it was.
    expect(screen.getByTestId('change-job-total')).toHaveTextContent('$13,292.25');
    expect(screen.getByTestId('change-job-total')).not.toHaveTextContent('$15,133.44');
    expect(screen.queryByRole('button', { name: 'Accept change' })).toBeNull();
  });

  it('shows a credit: the work taken off at its price, the credit and the smaller total', async () => {
    const view = changeOrderQuoteView();
    // The second waterfall's boulders come off (−1,200.00, taxed at 3.4375 % = −41.25) and the
    // stream's labor goes from 30 to 20 ft (−400.00, untaxed): −1,641.25 in all, so the job goes
    // from 13,292.25 to 11,651.00.
    const credit = {
      ...view,
      changeOrder: {
        ...view.changeOrder!,
        title: 'No second waterfall',
        lines: [
          {
            change: 'removed' as const,
            description: 'Boulders for the second waterfall',
            quantity: '4',
            unit: 't',
            fromQuantity: '4',
            toQuantity: '0',
            price: '-1200.00',
          },
          {
            change: 'reduced' as const,
            description: 'Stream building',
            quantity: '10',
            unit: 'ft',
            fromQuantity: '30',
            toQuantity: '20',
            price: '-400.00',
          },
        ],
        priceBeforeTax: '-1600.00',
        tax: '-41.25',
        total: '-1641.25',
        newJobTotal: '11651.00',
      },
    };
    mockApi({ [GET]: json(credit) });
    renderQuotePage();

    const change = await screen.findByRole('region', { name: 'Change to your project' });
    const lines = within(change).getByRole('table', {
      name: 'What the change adds and takes off',
    });
    const rows = within(lines).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('Boulders for the second waterfallTaken off-$1,200.00');
    expect(rows[2]).toHaveTextContent('Stream building30 → 20 ft-$400.00');
    expect(within(change).getByText('Credit to you, tax included')).toBeInTheDocument();
    expect(screen.getByTestId('change-total')).toHaveTextContent('-$1,641.25');
    expect(screen.getByTestId('change-job-total')).toHaveTextContent(
      '$13,292.25 → becomes $11,651.00',
    );
    expect(screen.getByRole('form', { name: 'Accept this change' })).toHaveTextContent(
      'This change is a credit of $1,641.25, tax included, and brings your project to $11,651.00. It comes off the balance due when the work is finished.',
    );
  });

  it('shows an answered change read-only when the link is opened again', async () => {
    mockApi({ [GET]: json(changeOrderQuoteView('accepted')) });
    renderQuotePage();
    expect(
      await screen.findByRole('heading', { name: /^Change accepted on .*2027/ }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Accept this change' })).toBeNull();
    expect(screen.queryByRole('link', { name: 'Review and accept' })).toBeNull();
  });
});

describe('The quote page for the final invoice', () => {
  it('leads with the invoice: total, deposit paid and the balance to pay', async () => {
    mockApi({ [GET]: json(invoiceQuoteView()) });
    renderQuotePage();

    const invoice = await screen.findByRole('region', { name: 'Your final invoice' });
    expect(screen.getByTestId('invoice-total')).toHaveTextContent('$15,133.44');
    expect(screen.getByTestId('invoice-deposit')).toHaveTextContent('−$3,987.68');
    expect(screen.getByTestId('invoice-balance')).toHaveTextContent('$11,145.76');
    expect(
      within(invoice).getByRole('button', { name: 'Pay the balance of $11,145.76' }),
    ).toBeInTheDocument();
    expect(precedes(invoice, screen.getByRole('region', { name: 'Your water feature' }))).toBe(
      true,
    );

    // The acceptance read-only; no forms, no deposit panel.
    expect(screen.getByText(/You accepted this quote on/)).toHaveTextContent('Bram Thistlewood');
    expect(screen.queryByRole('checkbox')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Accept quote' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Pay deposit/ })).toBeNull();
    expect(screen.queryByText('Deposit received')).toBeNull();
    expect(screen.queryByRole('region', { name: 'Payment schedule' })).toBeNull();
    expect(document.title).toBe('Final invoice for quote 1042 from Stillwater Ponds & Gardens');
  });

  it('sends the homeowner to checkout for the balance', async () => {
    const assign = vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const server = mockApi({
      [GET]: json(invoiceQuoteView()),
      [CHECKOUT]: json({ url: 'https://pay.example/checkout/cs_test_balance' }),
    });
    const { user } = renderQuotePage();
    await user.click(await screen.findByRole('button', { name: 'Pay the balance of $11,145.76' }));

    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('https://pay.example/checkout/cs_test_balance'),
    );
    expect(server.callsTo(CHECKOUT)).toHaveLength(1);
    expect(server.callsTo(CHECKOUT)[0]!.body).toBeUndefined();
  });

  it('after paying, checks every few seconds until the invoice is paid in full', async () => {
    const server = mockApi({
      [GET]: [json(invoiceQuoteView()), json(invoiceQuoteView()), json(invoiceQuoteView('paid'))],
    });
    renderQuotePage(`${QUOTE_PATH}?payment=success`, { pollMs: 30 });

    expect(
      await screen.findByText('Thank you — we’re confirming your payment'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Pay the balance/ })).toBeNull();
    expect(await screen.findByText('Paid in full — thank you')).toBeInTheDocument();
    expect(
      screen.getByText(/We received your payment of \$11,145\.76 on .*2027/),
    ).toBeInTheDocument();
    expect(screen.getByText('Balance, paid')).toBeInTheDocument();
    expect(server.callsTo(GET)).toHaveLength(3);
    // Paid: the checking stops.
    await new Promise((resolve) => setTimeout(resolve, 120));
    expect(server.callsTo(GET)).toHaveLength(3);
  });

  it('after a cancelled payment, offers the balance again', async () => {
    mockApi({ [GET]: json(invoiceQuoteView()) });
    renderQuotePage(`${QUOTE_PATH}?payment=cancelled`);
    expect(await screen.findByText('Your payment wasn’t completed')).toBeInTheDocument();
    expect(screen.getByText(/You can pay the balance whenever you’re ready/)).toBeInTheDocument();
    expect(
      screen.getByRole('button', { name: 'Pay the balance of $11,145.76' }),
    ).toBeInTheDocument();
  });
});
