import { configure, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCompany, buildCurrentUser, buildPricedEstimate } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// The first visit to a route loads its chunk, which takes a while under test.
configure({ asyncUtilTimeout: 4000 });

const estimator = buildCurrentUser({ name: 'Esme Estimator', role: 'estimator' });

const record = {
  id: 'pt-1',
  name: 'Back-garden pond',
  input: {},
  takeoff: {},
  priced: buildPricedEstimate(),
  priceBookVersion: { id: 'v-3', versionNumber: 3, effectiveDate: '2026-03-01' },
  createdByName: 'Esme Estimator',
  createdAt: '2026-03-02T10:00:00.000Z',
  repricedAt: null,
};

function signedIn(extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(estimator),
    ...extra,
  });
}

describe('priced takeoffs', () => {
  it('lists them and opens one with its lines grouped by category and its totals', async () => {
    signedIn({
      'GET /api/priced-takeoffs': json([
        {
          id: 'pt-1',
          name: 'Back-garden pond',
          total: '1573.41',
          versionNumber: 3,
          createdAt: record.createdAt,
        },
      ]),
      'GET /api/priced-takeoffs/pt-1': json(record),
    });
    const { user } = renderApp('/priced-takeoffs');

    const table = await screen.findByRole('table', { name: 'Priced takeoffs' });
    expect(within(table).getByText('$1,573.41')).toBeInTheDocument();
    await user.click(within(table).getByRole('link', { name: 'Back-garden pond' }));

    const materials = await screen.findByRole('table', { name: 'Materials lines' });
    expect(within(materials).getByText('Materials subtotal')).toBeInTheDocument();
    expect(within(materials).getByText('$1,012.50')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Labor lines' })).toHaveTextContent('Excavation');
    const totals = screen.getByRole('region', { name: 'Totals' });
    expect(totals).toHaveTextContent('Total$1,573.41');
    expect(totals).toHaveTextContent('Deposit (30.00 %)$472.02');
    expect(totals).toHaveTextContent('Gross margin 26.00 %');
    expect(screen.getByText('Priced with price book version 3')).toBeInTheDocument();
  });

  it('previews what re-pricing would change, then re-prices with the latest book', async () => {
    const repriced = {
      ...record,
      priceBookVersion: { id: 'v-4', versionNumber: 4, effectiveDate: '2026-04-01' },
    };
    const server = signedIn({
      'GET /api/priced-takeoffs/pt-1': [json(record), json(repriced)],
      'GET /api/priced-takeoffs/pt-1/reprice-preview': json({
        currentVersion: record.priceBookVersion,
        latestVersion: repriced.priceBookVersion,
        upToDate: false,
        bookChanges: [
          {
            section: 'material',
            code: 'LINER-45',
            field: 'unitCost',
            before: '0.85',
            after: '0.95',
          },
        ],
        estimateChanges: {
          lines: [
            {
              id: 'liner',
              change: 'changed',
              before: {
                description: 'EPDM liner, 45 mil',
                quantity: '400',
                unitCost: '1.00',
                extendedCost: '400.00',
                price: '500.00',
              },
              after: {
                description: 'EPDM liner, 45 mil',
                quantity: '400',
                unitCost: '1.1176',
                extendedCost: '447.04',
                price: '558.80',
              },
              costDelta: '47.04',
              priceDelta: '58.80',
            },
          ],
          totals: [{ field: 'total', before: '1573.41', after: '1636.49', delta: '63.08' }],
        },
        currentTotal: '1573.41',
        newTotal: '1636.49',
      }),
      'POST /api/priced-takeoffs/pt-1/reprice': json(repriced),
      'GET /api/priced-takeoffs': json([]),
    });
    const { user } = renderApp('/priced-takeoffs/pt-1');

    await user.click(
      await screen.findByRole('button', { name: 'See what re-pricing would change' }),
    );
    const dialog = await screen.findByRole('dialog');
    expect(
      await within(dialog).findByRole('table', { name: 'Price-book changes' }),
    ).toHaveTextContent('LINER-45');
    expect(within(dialog).getByRole('table', { name: 'Line changes' })).toHaveTextContent(
      'EPDM liner, 45 mil$500.00$558.80+$58.80',
    );
    expect(within(dialog).getByRole('table', { name: 'Total changes' })).toHaveTextContent(
      'Total$1,573.41$1,636.49',
    );

    await user.click(within(dialog).getByRole('button', { name: 'Re-price with the latest book' }));
    expect(await screen.findByText('Priced with price book version 4')).toBeInTheDocument();
    expect(server.callsTo('POST /api/priced-takeoffs/pt-1/reprice')).toHaveLength(1);
  });

  it('saves and prices the takeoff on screen, and says when there is no price book', async () => {
    const server = signedIn({
      'GET /api/company': json(buildCompany()),
      'POST /api/priced-takeoffs': [apiError(404, 'No price book'), json(record, 201)],
      'GET /api/priced-takeoffs': json([]),
    });
    const { user } = renderApp('/takeoff');

    await user.click(await screen.findByRole('button', { name: 'Save and price' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/^Name/), 'Back-garden pond');
    await user.click(within(dialog).getByRole('button', { name: 'Save and price' }));
    expect(await within(dialog).findByText(/no price book yet/)).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Save and price' }));
    expect(
      await within(dialog).findByText(/Back-garden pond is priced at \$1,573\.41/),
    ).toBeInTheDocument();
    expect(within(dialog).getByRole('link', { name: 'Open it' })).toHaveAttribute(
      'href',
      '/priced-takeoffs/pt-1',
    );
    const body = server.callsTo('POST /api/priced-takeoffs')[1]?.body as {
      name: string;
      input: { unitSystem: string };
    };
    expect(body.name).toBe('Back-garden pond');
    expect(body.input.unitSystem).toBe('us');
    await user.click(within(dialog).getByRole('button', { name: 'Close' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
  });
});
