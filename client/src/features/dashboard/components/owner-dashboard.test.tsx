import { ESTIMATE_STATUSES } from '@pondwright/shared';
import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import type { EstimateStats } from '../api/get-estimate-stats';
import { OwnerDashboard } from './owner-dashboard';

// The charts draw SVG measured by the browser; here it is enough to see what each was given.
vi.mock('@mantine/charts', () => ({
  BarChart: (props: { data: unknown; dataKey: string; series: Array<{ name: string }> }) => (
    <div
      data-testid={`bar-chart-${props.series.map((series) => series.name).join(',')}`}
      data-key={props.dataKey}
      data-points={JSON.stringify(props.data)}
    />
  ),
}));

function buildStats(overrides: Partial<EstimateStats> = {}): EstimateStats {
  const figures: Partial<Record<(typeof ESTIMATE_STATUSES)[number], [number, string]>> = {
    draft: [2, '150.00'],
    awaiting_approval: [1, '200.00'],
    accepted: [2, '700.00'],
    declined: [1, '250.50'],
  };
  return {
    byStatus: ESTIMATE_STATUSES.map((status) => ({
      status,
      count: figures[status]?.[0] ?? 0,
      value: figures[status]?.[1] ?? '0.00',
    })),
    winRatePct: '66.67',
    averageMarginPct: '30.20',
    currency: 'USD',
    ...overrides,
  };
}

function pointsOf(testId: string) {
  return JSON.parse(screen.getByTestId(testId).dataset.points ?? '[]') as Array<
    Record<string, unknown>
  >;
}

describe('OwnerDashboard', () => {
  it('shows the win rate and average margin and charts count and value by status', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/estimate-stats': json(buildStats()) });

    renderWithProviders(<OwnerDashboard />);

    expect(await screen.findByLabelText('Win rate')).toHaveTextContent('66.67 %');
    expect(screen.getByLabelText('Average margin')).toHaveTextContent('30.20 %');

    await screen.findByTestId('bar-chart-count');
    expect(screen.getByTestId('bar-chart-count').dataset.key).toBe('status');
    expect(pointsOf('bar-chart-count').map((point) => [point.status, point.count])).toEqual([
      ['Draft', 2],
      ['Awaiting', 1],
      ['Approved', 0],
      ['Sent', 0],
      ['Viewed', 0],
      ['Accepted', 2],
      ['Declined', 1],
      ['Expired', 0],
    ]);
    expect(pointsOf('bar-chart-value').map((point) => point.value)).toEqual([
      150, 200, 0, 0, 0, 700, 250.5, 0,
    ]);
  });

  it('says when nothing is decided or finalised yet', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/estimate-stats': json(buildStats({ winRatePct: null, averageMarginPct: null })),
    });

    renderWithProviders(<OwnerDashboard />);

    expect(await screen.findByText('Nothing accepted or declined yet')).toBeInTheDocument();
    expect(screen.getByText('No estimate finalised yet')).toBeInTheDocument();
  });

  it('shows an empty state before any estimate exists', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/estimate-stats': json(
        buildStats({
          byStatus: ESTIMATE_STATUSES.map((status) => ({ status, count: 0, value: '0.00' })),
        }),
      ),
    });

    renderWithProviders(<OwnerDashboard />);

    expect(await screen.findByText('No estimates yet')).toBeInTheDocument();
  });

  it('explains a failed load', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/estimate-stats': apiError(403, 'Owners only') });

    renderWithProviders(<OwnerDashboard />);

    expect(await screen.findByText('Could not load the pipeline')).toBeInTheDocument();
  });
});
