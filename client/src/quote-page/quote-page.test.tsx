import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { browser } from './lib/browser';
import {
  acceptedQuoteView,
  buildQuoteView,
  CONTENT_SHA256,
  paidQuoteView,
  QUOTE_PATH,
  QUOTE_TOKEN,
} from './testing/quote-view';
import { renderQuotePage } from './testing/render-quote-page';

const GET = `GET /api/quotes/${QUOTE_TOKEN}`;
const ACCEPT = `POST /api/quotes/${QUOTE_TOKEN}/accept`;
const DECLINE = `POST /api/quotes/${QUOTE_TOKEN}/decline`;
const CHECKOUT = `POST /api/quotes/${QUOTE_TOKEN}/checkout`;

const liveTotal = () => screen.getByTestId('live-total');
const liveDeposit = () => screen.getByTestId('live-deposit');

describe('The quote page', () => {
  it('shows the quote: company, numbers, the water feature, drawings, options, terms and safety', async () => {
    mockApi({ [GET]: json(buildQuoteView()) });
    renderQuotePage();

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Koi pond with waterfall and stream' }),
    ).toBeInTheDocument();
    expect(screen.getAllByText('Stillwater Ponds & Gardens').length).toBeGreaterThan(0);
    expect(screen.getByRole('img', { name: 'Stillwater Ponds & Gardens logo' })).toHaveAttribute(
      'src',
      `/api/quotes/${QUOTE_TOKEN}/logo`,
    );
    expect(screen.getByText('Quote 1042 · version 2')).toBeInTheDocument();
    expect(screen.getByText('Bram Thistlewood')).toBeInTheDocument();
    expect(screen.getByText('18 Alder Lane, Greenfield, OR 97123')).toBeInTheDocument();
    expect(screen.getByText('Valid until')).toBeInTheDocument();

    const feature = screen.getByRole('region', { name: 'Your water feature' });
    expect(within(feature).getByText('Water volume')).toBeInTheDocument();
    expect(within(feature).getByText('1,480 US gal')).toBeInTheDocument();
    expect(screen.getByText(/A 9 ft stream runs down/)).toBeInTheDocument();
    expect(
      within(screen.getByRole('region', { name: 'What’s included' })).getAllByRole('listitem'),
    ).toHaveLength(5);

    // Drawn from the data in the answer, not from the engine.
    expect(screen.getByRole('img', { name: /plan view/i })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /cross-section/i })).toBeInTheDocument();
    expect(screen.getAllByText('15 ft').length).toBeGreaterThan(0);

    const lighting = screen.getByRole('checkbox', { name: /Underwater LED lighting/ });
    expect(lighting).not.toBeChecked();
    expect(screen.getByText('+$850.00 plus $29.75 tax')).toBeInTheDocument();
    expect(screen.getByText('+$1,200.00, no tax')).toBeInTheDocument();
    expect(screen.getAllByText('Add-on')).toHaveLength(2);
    expect(screen.getByText('Alternate')).toBeInTheDocument();
    expect(screen.getByText('Discount (already taken off)')).toBeInTheDocument();

    expect(screen.getByRole('region', { name: 'Terms' })).toHaveTextContent(
      'Plants and fish are not included unless listed.',
    );
    const safety = screen.getByRole('region', { name: 'Safety' });
    expect(safety).toHaveTextContent(/GFCI-protected outlet/);
    expect(safety).toHaveTextContent(/utility-locate service/);
    expect(safety).toHaveTextContent(
      'Follow your local codes; electrical work by a licensed electrician.',
    );

    for (const link of screen.getAllByRole('link', { name: 'Download PDF' })) {
      expect(link).toHaveAttribute('href', `/api/quotes/${QUOTE_TOKEN}/pdf`);
    }
    expect(screen.getByRole('button', { name: 'Accept quote' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Decline' })).toBeInTheDocument();
    expect(document.title).toBe('Quote 1042 from Stillwater Ponds & Gardens');
  });

  it('updates the total, the deposit and the balance as options are chosen', async () => {
    mockApi({ [GET]: json(buildQuoteView()) });
    const { user } = renderQuotePage();
    await screen.findByRole('heading', { level: 1 });

    // Nothing chosen: the base total 12,412.50; deposit 30 % = 3,723.75; balance 8,688.75.
    expect(liveTotal()).toHaveTextContent('$12,412.50');
    expect(liveDeposit()).toHaveTextContent('$3,723.75');
    expect(screen.getByTestId('schedule-balance')).toHaveTextContent('$8,688.75');

    // Lighting: 12,412.50 + 850.00 + 29.75 tax = 13,292.25;
    // deposit 0.30 × 13,292.25 = 3,987.675 → 3,987.68 (half up); balance 13,292.25 − 3,987.68 = 9,304.57.
    await user.click(screen.getByRole('checkbox', { name: /Underwater LED lighting/ }));
    expect(liveTotal()).toHaveTextContent('$13,292.25');
    expect(liveDeposit()).toHaveTextContent('$3,987.68');
    expect(screen.getByTestId('schedule-deposit')).toHaveTextContent('$3,987.68');
    expect(screen.getByTestId('schedule-balance')).toHaveTextContent('$9,304.57');

    // And the aerator: 13,292.25 + 325.00 + 11.38 = 13,628.63;
    // deposit 0.30 × 13,628.63 = 4,088.589 → 4,088.59; balance 9,540.04.
    await user.click(screen.getByRole('checkbox', { name: /Winter aerator/ }));
    expect(liveTotal()).toHaveTextContent('$13,628.63');
    expect(liveDeposit()).toHaveTextContent('$4,088.59');
    expect(screen.getByTestId('schedule-balance')).toHaveTextContent('$9,540.04');

    // Un-ticking the lighting leaves the aerator: 12,412.50 + 336.38 = 12,748.88; deposit 3,824.664 → 3,824.66.
    await user.click(screen.getByRole('checkbox', { name: /Underwater LED lighting/ }));
    expect(liveTotal()).toHaveTextContent('$12,748.88');
    expect(liveDeposit()).toHaveTextContent('$3,824.66');
  });

  it('accepts with the name, the consent, the options chosen and the version shown', async () => {
    const server = mockApi({
      [GET]: json(buildQuoteView()),
      [ACCEPT]: json(acceptedQuoteView()),
    });
    const { user } = renderQuotePage();
    await user.click(await screen.findByRole('checkbox', { name: /Underwater LED lighting/ }));
    await user.type(screen.getByRole('textbox', { name: /Your full name/ }), '  Bram Thistlewood ');
    await user.click(
      screen.getByRole('checkbox', {
        name: 'I accept this quote, the options I chose and the terms above',
      }),
    );
    await user.click(screen.getByRole('button', { name: 'Accept quote' }));

    const heading = await screen.findByRole('heading', { name: 'Thank you, Bram Thistlewood' });
    expect(server.callsTo(ACCEPT)).toHaveLength(1);
    expect(server.callsTo(ACCEPT)[0]!.body).toEqual({
      fullName: 'Bram Thistlewood',
      consent: true,
      optionIds: ['opt-lighting'],
      contentSha256: CONTENT_SHA256,
    });
    await waitFor(() => expect(heading).toHaveFocus());
    const panel = screen.getByRole('region', { name: 'Your acceptance' });
    expect(within(panel).getByText('Underwater LED lighting (3 lights)')).toBeInTheDocument();
    expect(within(panel).getByText('$13,292.25')).toBeInTheDocument();
    expect(within(panel).getByText('$9,304.57')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Pay deposit of $3,987.68' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Accept quote' })).toBeNull();
  });

  it('checks the name and the consent before sending anything', async () => {
    const server = mockApi({ [GET]: json(buildQuoteView()) });
    const { user } = renderQuotePage();
    await user.click(await screen.findByRole('button', { name: 'Accept quote' }));

    const name = screen.getByRole('textbox', { name: /Your full name/ });
    expect(name).toHaveAttribute('aria-invalid', 'true');
    expect(name).toHaveFocus();
    expect(screen.getByText('Type your full name')).toBeInTheDocument();
    expect(
      screen.getByText('Tick the box to agree to the quote and its terms'),
    ).toBeInTheDocument();
    expect(server.callsTo(ACCEPT)).toHaveLength(0);
  });

  it('shows the server’s field errors on the fields', async () => {
    mockApi({
      [GET]: json(buildQuoteView()),
      [ACCEPT]: apiError(400, 'Some fields need attention', [
        { field: 'fullName', message: 'Type your first and last name' },
        { field: 'consent', message: 'Tick the box to agree to the quote and its terms' },
      ]),
    });
    const { user } = renderQuotePage();
    await user.type(await screen.findByRole('textbox', { name: /Your full name/ }), 'Bram');
    const consent = screen.getByRole('checkbox', { name: /I accept this quote/ });
    await user.click(consent);
    await user.click(screen.getByRole('button', { name: 'Accept quote' }));

    const name = screen.getByRole('textbox', { name: /Your full name/ });
    expect(await screen.findByText('Type your first and last name')).toBeInTheDocument();
    expect(name).toHaveAttribute('aria-invalid', 'true');
    expect(name).toHaveAccessibleDescription(/Type your first and last name/);
    expect(name).toHaveFocus();
    expect(consent).toHaveAttribute('aria-invalid', 'true');
  });

  it('asks for a reload when the quote changed since it was opened', async () => {
    const reload = vi.spyOn(browser, 'reload').mockImplementation(() => {});
    mockApi({
      [GET]: json(buildQuoteView()),
      [ACCEPT]: json(
        {
          statusCode: 409,
          error: 'Conflict',
          code: 'QUOTE_VERSION_CHANGED',
          message: 'A newer version of this quote was sent.',
        },
        409,
      ),
    });
    const { user } = renderQuotePage();
    await user.type(
      await screen.findByRole('textbox', { name: /Your full name/ }),
      'Bram Thistlewood',
    );
    await user.click(screen.getByRole('checkbox', { name: /I accept this quote/ }));
    await user.click(screen.getByRole('button', { name: 'Accept quote' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This quote was updated; reload to see the new version');
    await waitFor(() => expect(alert).toHaveFocus());
    await user.click(within(alert).getByRole('button', { name: 'Reload the quote' }));
    expect(reload).toHaveBeenCalledOnce();
  });

  it('declines with an optional reason', async () => {
    const server = mockApi({
      [GET]: json(buildQuoteView()),
      [DECLINE]: json(
        buildQuoteView({ state: 'declined', declinedAt: '2027-04-09T10:00:00.000Z' }),
      ),
    });
    const { user } = renderQuotePage();
    await user.click(await screen.findByRole('button', { name: 'Decline' }));
    const reason = screen.getByRole('textbox', { name: /Would you like to say why/ });
    expect(reason).toHaveFocus();
    await user.type(reason, 'We are moving next year.');
    await user.click(screen.getByRole('button', { name: 'Decline quote' }));

    expect(
      await screen.findByRole('heading', { name: 'You declined this quote' }),
    ).toBeInTheDocument();
    expect(server.callsTo(DECLINE)[0]!.body).toEqual({ reason: 'We are moving next year.' });
    expect(screen.queryByRole('button', { name: 'Accept quote' })).toBeNull();
    const declined = screen.getByRole('region', { name: 'You declined this quote' });
    expect(
      within(declined).getByRole('link', { name: 'hello@stillwater.example' }),
    ).toHaveAttribute('href', 'mailto:hello@stillwater.example');
  });

  it('shows the expired page with the server’s message for a 410', async () => {
    mockApi({
      [GET]: apiError(
        410,
        'This link has expired. Contact Stillwater Ponds & Gardens for a new one.',
      ),
    });
    renderQuotePage();
    const heading = await screen.findByRole('heading', {
      level: 1,
      name: 'This link has expired or was withdrawn',
    });
    expect(
      screen.getByText('This link has expired. Contact Stillwater Ponds & Gardens for a new one.'),
    ).toBeInTheDocument();
    await waitFor(() => expect(heading).toHaveFocus());
    expect(screen.queryByRole('button', { name: 'Accept quote' })).toBeNull();
  });

  it('says it can’t find an unknown quote', async () => {
    mockApi({ [GET]: apiError(404, 'Quote not found') });
    renderQuotePage();
    expect(
      await screen.findByRole('heading', { level: 1, name: 'We couldn’t find this quote' }),
    ).toBeInTheDocument();
  });

  it('says the same for a link without a token, without asking the server', () => {
    const server = mockApi({});
    renderQuotePage('/q/');
    expect(
      screen.getByRole('heading', { level: 1, name: 'We couldn’t find this quote' }),
    ).toBeInTheDocument();
    expect(server.requests).toHaveLength(0);
  });

  it('after paying, checks every few seconds until the deposit is received', async () => {
    const server = mockApi({
      [GET]: [json(acceptedQuoteView()), json(acceptedQuoteView()), json(paidQuoteView())],
    });
    renderQuotePage(`${QUOTE_PATH}?payment=success`, { pollMs: 30 });

    expect(
      await screen.findByText('Thank you — we’re confirming your payment'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Pay deposit/ })).toBeNull();
    expect(await screen.findByText('Deposit received')).toBeInTheDocument();
    expect(screen.getByText(/We received your deposit of \$3,987\.68/)).toBeInTheDocument();
    expect(server.callsTo(GET)).toHaveLength(3);
    // Paid: the checking stops.
    await new Promise((resolve) => setTimeout(resolve, 120));
    expect(server.callsTo(GET)).toHaveLength(3);
  });

  it('stops checking after a while and offers to check again', async () => {
    const server = mockApi({ [GET]: json(acceptedQuoteView()) });
    const { user } = renderQuotePage(`${QUOTE_PATH}?payment=success`, {
      pollMs: 20,
      pollForMs: 150,
    });
    expect(await screen.findByText('Your payment is still being confirmed')).toBeInTheDocument();
    const calls = server.callsTo(GET).length;
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(server.callsTo(GET)).toHaveLength(calls);

    server.set(GET, json(paidQuoteView()));
    await user.click(screen.getByRole('button', { name: 'Check again' }));
    expect(await screen.findByText('Deposit received')).toBeInTheDocument();
  });

  it('after a cancelled payment, offers the deposit again and sends the homeowner to checkout', async () => {
    const assign = vi.spyOn(browser, 'assign').mockImplementation(() => {});
    const server = mockApi({
      [GET]: json(acceptedQuoteView()),
      [CHECKOUT]: json({ url: 'https://pay.example/checkout/cs_test_123' }),
    });
    const { user } = renderQuotePage(`${QUOTE_PATH}?payment=cancelled`);
    expect(await screen.findByText('Your payment wasn’t completed')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Pay deposit of $3,987.68' }));

    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('https://pay.example/checkout/cs_test_123'),
    );
    expect(server.callsTo(CHECKOUT)).toHaveLength(1);
  });

  it('shows an accepted quote read-only, with who accepted it and when', async () => {
    mockApi({ [GET]: json(paidQuoteView()) });
    renderQuotePage();
    expect(
      await screen.findByRole('heading', { name: 'Thank you, Bram Thistlewood' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/You accepted this quote on/)).toHaveTextContent('Bram Thistlewood');
    expect(screen.queryByRole('checkbox')).toBeNull();
    expect(screen.getByText('Chosen')).toBeInTheDocument();
    expect(screen.getAllByText('Not chosen')).toHaveLength(2);
    expect(screen.getByText('Deposit received')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Pay deposit/ })).toBeNull();
  });
});
