import { configure, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { buildCurrentUser, buildPriceBookVersion } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// The first visit to a route loads its chunk, which takes a while under test.
configure({ asyncUtilTimeout: 4000 });

// The chart draws with SVG measured by the browser; here it is enough to see what it was given.
vi.mock('@mantine/charts', () => ({
  LineChart: (props: { data: unknown; dataKey: string; series: Array<{ name: string }> }) => (
    <div
      data-testid="pump-chart"
      data-key={props.dataKey}
      data-series={props.series.map((series) => series.name).join(',')}
      data-points={JSON.stringify(props.data)}
    />
  ),
}));

const owner = buildCurrentUser({ role: 'owner' });

function chartPoints() {
  return JSON.parse(screen.getByTestId('pump-chart').dataset.points ?? '[]') as unknown;
}

describe('the pump curve editor', () => {
  it('draws head against flow from the points and redraws as they are typed', async () => {
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(owner),
      'GET /api/price-book': json(buildPriceBookVersion()),
    });
    const { user } = renderApp('/price-book');

    await user.click(await screen.findByRole('button', { name: 'Pump curve for PUMP-3000' }));
    const dialog = await screen.findByRole('dialog');
    await within(dialog).findByTestId('pump-chart');
    expect(screen.getByTestId('pump-chart').dataset.key).toBe('flowGph');
    expect(screen.getByTestId('pump-chart').dataset.series).toBe('headFt');
    expect(chartPoints()).toEqual([
      { flowGph: 0, headFt: 18 },
      { flowGph: 1500, headFt: 12 },
      { flowGph: 3000, headFt: 4 },
    ]);

    const head = within(dialog).getByLabelText('Head (ft), point 2');
    await user.clear(head);
    await user.type(head, '13.5');
    expect(chartPoints()).toEqual([
      { flowGph: 0, headFt: 18 },
      { flowGph: 1500, headFt: 13.5 },
      { flowGph: 3000, headFt: 4 },
    ]);

    await user.click(within(dialog).getByRole('button', { name: 'Add a point' }));
    const flow = within(dialog).getByLabelText('Flow (gph), point 4');
    await user.clear(flow);
    await user.type(flow, '2000');
    expect(within(dialog).getByText('List curve points by rising flow')).toBeInTheDocument();
    expect(chartPoints()).toEqual([
      { flowGph: 0, headFt: 18 },
      { flowGph: 1500, headFt: 13.5 },
      { flowGph: 2000, headFt: 0 },
      { flowGph: 3000, headFt: 4 },
    ]);
    expect(screen.getByText('1 unsaved change')).toBeInTheDocument();
  });
});
