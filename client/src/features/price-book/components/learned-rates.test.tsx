import type { LearnedRate } from '@pondwright/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { LearnedRates } from './learned-rates';

function rate(overrides: Partial<LearnedRate>): LearnedRate {
  return {
    parameter: 'linerLaborHoursPer100SqFt',
    label: 'Liner and underlayment laid',
    unit: 'labor-hours per 100 ft²',
    task: 'linerUnderlayment',
    bookValue: 1.5,
    learnedValue: 2.06,
    jobs: 3,
    estimatedHours: 30,
    actualHours: 41.1,
    hoursRatio: 1.37,
    ...overrides,
  };
}

const RATES: LearnedRate[] = [
  rate({}),
  rate({
    parameter: 'machineBankCuYdPerHour',
    label: 'Machine digging',
    unit: 'bank yd³ per hour',
    task: 'excavation',
    bookValue: 4,
    learnedValue: 4.55,
    jobs: 2,
    estimatedHours: 50,
    actualHours: 44,
    hoursRatio: 0.88,
  }),
  rate({
    parameter: 'cableLaborHoursPerFt',
    label: 'Low-voltage cable run',
    unit: 'labor-hours per ft',
    task: 'electricalLighting',
    bookValue: 0.02,
    learnedValue: null,
    jobs: 0,
    estimatedHours: 0,
    actualHours: 0,
    hoursRatio: null,
  }),
];

const row = (label: string) =>
  within(screen.getByRole('table', { name: 'Crew rates' }))
    .getByText(label)
    .closest('tr')!;

describe('Crew rates', () => {
  it('shows each rate beside the book, the hours against the quote and the jobs behind it', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/learned-rates': json(RATES) });
    renderWithProviders(<LearnedRates canAdopt={false} />);

    await screen.findByRole('table', { name: 'Crew rates' });
    const liner = row('Liner and underlayment laid');
    expect(within(liner).getByText('1.5 labor-hours per 100 ft²')).toBeInTheDocument();
    expect(within(liner).getByText('2.06 labor-hours per 100 ft²')).toBeInTheDocument();
    expect(within(liner).getByText('+37 % hours')).toBeInTheDocument();
    expect(within(liner).getByText('41.1 h logged, 30 h quoted')).toBeInTheDocument();
    expect(within(liner).getByText('3')).toBeInTheDocument();

    const digging = row('Machine digging');
    expect(within(digging).getByText('4 bank yd³ per hour')).toBeInTheDocument();
    expect(within(digging).getByText('4.55 bank yd³ per hour')).toBeInTheDocument();
    expect(within(digging).getByText('−12 % hours')).toBeInTheDocument();

    const cable = row('Low-voltage cable run');
    expect(within(cable).getByText('Not enough data')).toBeInTheDocument();
    expect(within(cable).getByText('0')).toBeInTheDocument();

    // Estimators read the rates; only an owner puts one in the book.
    expect(screen.queryByRole('button', { name: 'Use in the price book' })).toBeNull();
  });

  it('lets an owner put a learned rate in the price book after confirming', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/learned-rates': [json(RATES), json([rate({ bookValue: 2.06 }), ...RATES.slice(1)])],
      'POST /api/learned-rates/adopt': json({ id: 'v8', versionNumber: 8 }, 201),
    });
    const { user } = renderWithProviders(<LearnedRates canAdopt />);

    await screen.findByRole('table', { name: 'Crew rates' });
    // Nothing learned, nothing to adopt.
    expect(
      within(row('Low-voltage cable run')).queryByRole('button', { name: 'Use in the price book' }),
    ).toBeNull();
    await user.click(
      within(row('Liner and underlayment laid')).getByRole('button', {
        name: 'Use in the price book',
      }),
    );
    const dialog = await screen.findByRole('dialog', {
      name: 'Use the crews’ rate in the price book?',
    });
    expect(dialog).toHaveTextContent(
      'Liner and underlayment laid changes from 1.5 labor-hours per 100 ft² to 2.06 labor-hours per 100 ft², learned from 3 closed jobs.',
    );
    expect(server.callsTo('POST /api/learned-rates/adopt')).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Use in the price book' }));

    await waitFor(() => expect(server.callsTo('POST /api/learned-rates/adopt')).toHaveLength(1));
    expect(server.callsTo('POST /api/learned-rates/adopt')[0]?.body).toEqual({
      parameter: 'linerLaborHoursPer100SqFt',
    });
    expect(await screen.findByText(/in version 8 of the price book/)).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    // The price-book queries load again, the learned rates among them: the book now says 2.06.
    await waitFor(() => expect(server.callsTo('GET /api/learned-rates')).toHaveLength(2));
    expect(
      within(row('Liner and underlayment laid')).queryByRole('button', {
        name: 'Use in the price book',
      }),
    ).toBeNull();
  });

  it('keeps a refusal in the dialog', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/learned-rates': json(RATES),
      'POST /api/learned-rates/adopt': json(
        {
          statusCode: 409,
          error: 'Conflict',
          message: 'No closed job has taught this rate yet.',
          code: 'NOTHING_LEARNED',
        },
        409,
      ),
    });
    const { user } = renderWithProviders(<LearnedRates canAdopt />);

    await user.click(
      within(await screen.findByRole('table', { name: 'Crew rates' }))
        .getAllByRole('button', { name: 'Use in the price book' })
        .at(1)!,
    );
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Use in the price book' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'No closed job has taught this rate yet.',
    );
  });
});
