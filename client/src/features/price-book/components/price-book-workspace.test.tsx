import { configure, screen, waitFor, within } from '@testing-library/react';
import type { PriceBook } from '@pondwright/shared/pricing';
import { describe, expect, it } from 'vitest';
import { todayIsoDate } from '@/lib/format';
import {
  buildCurrentUser,
  buildPriceBook,
  buildPriceBookVersion,
  type PriceBookVersionRecord,
} from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// The first visit to a route loads its chunk, which takes a while under test.
configure({ asyncUtilTimeout: 4000 });

const owner = buildCurrentUser({ name: 'Olive Owner', role: 'owner' });
const estimator = buildCurrentUser({ name: 'Esme Estimator', role: 'estimator' });
const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });

function signedInAs(user: typeof owner, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(user),
    'GET /api/price-book': json(buildPriceBookVersion()),
    ...extra,
  });
}

describe('the price book', () => {
  it('shows a field error on a cell with a bad amount and counts the unsaved change', async () => {
    signedInAs(owner);
    const { user } = renderApp('/price-book');

    const cost = await screen.findByLabelText('Unit cost for LINER-45');
    expect(cost).toHaveValue('0.85');
    await user.clear(cost);
    await user.type(cost, '12.345678');

    expect(cost).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText(/at most 4 decimals/)).toBeInTheDocument();
    const bar = screen.getByRole('region', { name: 'Unsaved changes' });
    expect(within(bar).getByText('1 unsaved change')).toBeInTheDocument();
    expect(within(bar).getByText('1 field to fix')).toBeInTheDocument();
    expect(within(bar).getByRole('button', { name: 'Save as new version' })).toBeDisabled();
  });

  it('saves the edited book with a PUT and puts a server error on its cell', async () => {
    const saved: PriceBookVersionRecord = buildPriceBookVersion({ versionNumber: 4 });
    const server = signedInAs(owner, {
      'PUT /api/price-book': [
        apiError(400, 'Check the highlighted fields', [
          { field: 'book.materials.0.unitCost', message: 'More than the supplier charges' },
        ]),
        json(saved, 201),
      ],
    });
    const { user } = renderApp('/price-book');

    const cost = await screen.findByLabelText('Unit cost for LINER-45');
    await user.clear(cost);
    await user.type(cost, '0.95');
    await user.type(screen.getByLabelText('Note'), 'Liner went up');
    await user.click(screen.getByRole('button', { name: 'Save as new version' }));

    expect(await screen.findByText('More than the supplier charges')).toBeInTheDocument();
    expect(screen.getByLabelText('Unit cost for LINER-45')).toHaveAttribute('aria-invalid', 'true');
    const [put] = server.callsTo('PUT /api/price-book');
    const body = put?.body as { effectiveDate: string; note: string; book: PriceBook };
    expect(body.effectiveDate).toBe(todayIsoDate());
    expect(body.note).toBe('Liner went up');
    expect(body.book).toEqual({
      ...buildPriceBook(),
      materials: buildPriceBook().materials.map((material, index) =>
        index === 0 ? { ...material, unitCost: '0.95' } : material,
      ),
    });

    // Typing in the cell clears the server's message; the second save goes through.
    await user.type(screen.getByLabelText('Unit cost for LINER-45'), '0');
    expect(screen.queryByText('More than the supplier charges')).not.toBeInTheDocument();
    server.set('GET /api/price-book', json(saved));
    await user.click(screen.getByRole('button', { name: 'Save as new version' }));
    await waitFor(() =>
      expect(screen.queryByRole('region', { name: 'Unsaved changes' })).not.toBeInTheDocument(),
    );
    expect(server.callsTo('PUT /api/price-book')).toHaveLength(2);
  });

  it('asks before leaving the page with unsaved edits, but not when switching tabs', async () => {
    signedInAs(owner);
    const { user, router } = renderApp('/price-book');

    await user.type(await screen.findByLabelText('Name for LINER-45'), ' (black)');
    await user.click(screen.getByRole('tab', { name: 'Labor' }));
    expect(router.state.location.pathname).toBe('/price-book/labor');
    expect(screen.queryByText('Leave without saving?')).not.toBeInTheDocument();
    expect(await screen.findByLabelText('Wage per hour for LEAD')).toBeInTheDocument();

    // The policy tab has a form of its own; the page's one guard still covers the tables.
    await user.click(screen.getByRole('tab', { name: 'Policy' }));
    expect(await screen.findByLabelText('Labor markup %')).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    await user.click(within(nav).getByRole('link', { name: 'Home' }));
    expect(await screen.findByText('Leave without saving?')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/price-book/policy');

    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(router.state.location.pathname).toBe('/price-book/policy');
    expect(screen.getByText('1 unsaved change')).toBeInTheDocument();

    await user.click(within(nav).getByRole('link', { name: 'Home' }));
    await user.click(await screen.findByRole('button', { name: 'Leave and discard' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });

  it('searches, filters and sorts the materials', async () => {
    signedInAs(owner);
    const { user } = renderApp('/price-book');
    const table = await screen.findByRole('table', { name: 'Materials' });

    await user.type(screen.getByLabelText('Search materials'), 'pump');
    expect(within(table).getAllByRole('row')).toHaveLength(2);
    expect(within(table).getByLabelText('Code for PUMP-3000')).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Search materials'));

    await user.click(screen.getByRole('button', { name: 'Sort by Unit cost' }));
    const codes = within(table)
      .getAllByLabelText(/^Code for /)
      .map((input) => (input as HTMLInputElement).value);
    expect(codes).toEqual(['UNDER-8', 'LINER-45', 'GRAVEL-RIVER', 'PUMP-3000']);
  });

  it('shows estimators the book read-only', async () => {
    const server = signedInAs(estimator);
    renderApp('/price-book');

    const table = await screen.findByRole('table', { name: 'Materials' });
    expect(within(table).getByText('$0.85')).toBeInTheDocument();
    expect(within(table).queryByRole('textbox')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add a material' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Delete / })).not.toBeInTheDocument();
    expect(screen.getByText('Read only')).toBeInTheDocument();
    expect(server.callsTo('PUT /api/price-book')).toHaveLength(0);
  });

  it('shows Price book in the navigation to owners and estimators, never to crew leads', async () => {
    signedInAs(estimator);
    const first = renderApp('/');
    const estimatorNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(estimatorNav).getByRole('link', { name: 'Price book' })).toHaveAttribute(
      'href',
      '/price-book',
    );
    first.unmount();

    const server = signedInAs(crewLead);
    renderApp('/price-book');
    const crewNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(crewNav).queryByRole('link', { name: 'Price book' })).not.toBeInTheDocument();
    expect(
      within(crewNav).queryByRole('link', { name: 'Priced takeoffs' }),
    ).not.toBeInTheDocument();
    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(server.callsTo('GET /api/price-book')).toHaveLength(0);
  });

  it('lists every bad row of a rejected CSV import, with line and column', async () => {
    const server = signedInAs(owner, {
      'POST /api/price-book/import': json(
        {
          statusCode: 400,
          error: 'Bad Request',
          message: 'The file has 3 rows to fix.',
          details: [
            {
              field: 'materials.4.unitCost',
              message: 'Enter an amount',
              line: 7,
              column: 'unitCost',
            },
            { field: 'materials.1.kind', message: 'Unknown kind', line: 4, column: 'kind' },
            {
              field: 'laborRoles.0.burdenPct',
              message: 'At most 100',
              line: 12,
              column: 'burdenPct',
            },
          ],
        },
        400,
      ),
    });
    const { user } = renderApp('/price-book/import-export');

    await screen.findByRole('heading', { name: 'Import a CSV' });
    const input = document.querySelector<HTMLInputElement>('input[type="file"]')!;
    await user.upload(
      input,
      new File(['section,code,name\nmaterials,LINER-45,Liner\n'], 'book.csv', { type: 'text/csv' }),
    );
    const importButton = screen.getByRole('button', { name: 'Import as new version' });
    await waitFor(() => expect(importButton).toBeEnabled());
    await user.click(importButton);

    const rows = within(await screen.findByRole('table', { name: 'Rows to fix' })).getAllByRole(
      'row',
    );
    expect(rows.slice(1).map((row) => row.textContent)).toEqual([
      '4kindUnknown kind',
      '7unitCostEnter an amount',
      '12burdenPctAt most 100',
    ]);
    expect(screen.getByText('Nothing was imported')).toBeInTheDocument();
    expect(screen.getByText(/3 problems in the file/)).toBeInTheDocument();
    expect(server.callsTo('POST /api/price-book/import')[0]?.body).toMatchObject({
      csv: 'section,code,name\nmaterials,LINER-45,Liner\n',
      effectiveDate: todayIsoDate(),
    });
  });

  it('offers an owner a sample book when the company has none yet', async () => {
    signedInAs(owner, { 'GET /api/price-book': apiError(404, 'No price book yet') });
    const { user } = renderApp('/price-book');

    await user.click(await screen.findByRole('button', { name: 'Start from the sample book' }));
    expect(await screen.findByRole('table', { name: 'Materials' })).toBeInTheDocument();
    expect(screen.getByText('New book, not saved yet')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save as new version' })).toBeEnabled();
  });

  it('keeps the sample factory book valid', async () => {
    const { priceBookSchema } = await import('@pondwright/shared/pricing');
    expect(priceBookSchema.safeParse(buildPriceBook()).success).toBe(true);
  });
});
