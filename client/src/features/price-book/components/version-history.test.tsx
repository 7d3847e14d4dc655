import { configure, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser, buildPriceBookVersion } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// The first visit to a route loads its chunk, which takes a while under test.
configure({ asyncUtilTimeout: 4000 });

describe('the price-book history', () => {
  it('lists versions newest first and shows who changed what in one', async () => {
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(buildCurrentUser({ role: 'owner' })),
      'GET /api/price-book': json(buildPriceBookVersion()),
      'GET /api/price-book/versions': json([
        {
          id: 'v-2',
          versionNumber: 2,
          effectiveDate: '2026-03-01',
          authorName: 'Olive Owner',
          note: 'Spring prices',
          createdAt: '2026-02-27T15:00:00.000Z',
          status: 'current',
          changeCount: 2,
        },
        {
          id: 'v-1',
          versionNumber: 1,
          effectiveDate: '2026-01-05',
          authorName: 'Olive Owner',
          note: null,
          createdAt: '2026-01-05T09:00:00.000Z',
          changeCount: 0,
        },
      ]),
      'GET /api/price-book/versions/v-2/changes': json([
        {
          section: 'materials',
          code: 'LINER-45',
          field: 'unitCost',
          before: '0.80',
          after: '0.85',
        },
        { section: 'policy', code: '', field: 'markupPct.labor', before: '35', after: '40' },
      ]),
    });
    const { user } = renderApp('/price-book/history');

    await user.click(await screen.findByRole('button', { name: /Version 2/ }));
    const changes = await screen.findByRole('table', { name: 'Changes in version 2' });
    const rows = within(changes).getAllByRole('row').slice(1);
    expect(rows.map((row) => row.textContent)).toEqual([
      'MaterialsLINER-45Unit cost0.800.85',
      'Policy—Labor markup %3540',
    ]);
    expect(screen.getByText('Spring prices')).toBeInTheDocument();
    expect(screen.getByText('In effect')).toBeInTheDocument();
    expect(screen.getByText('2 changes')).toBeInTheDocument();
  });
});
