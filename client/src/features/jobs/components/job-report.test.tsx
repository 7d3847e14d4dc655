import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildJob, buildReport } from '../testing/build-job';
import { JobPage } from './job-page';

// The chart draws SVG measured by the browser; here it is enough to see what it was given.
vi.mock('@mantine/charts', () => ({
  BarChart: (props: { data: unknown; series: Array<{ name: string }> }) => (
    <div
      data-testid={`bar-chart-${props.series.map((series) => series.name).join(',')}`}
      data-points={JSON.stringify(props.data)}
    />
  ),
}));

const job = buildJob();
const ID = job.id;
const routes = {
  job: `GET /api/jobs/${ID}`,
  report: `GET /api/jobs/${ID}/report`,
  csv: `GET /api/jobs/${ID}/report.csv`,
};

/** jsdom has no object URLs; the stand-ins are removed again after each test. */
const realObjectUrls = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
afterEach(() => {
  URL.createObjectURL = realObjectUrls.create;
  URL.revokeObjectURL = realObjectUrls.revoke;
});

async function openReport() {
  const rendered = renderWithProviders(
    <JobPage
      id={ID}
      access={{ money: true, schedule: true, close: true }}
      logHref={(id, date) => `/jobs/${id}/log/${date}`}
    />,
  );
  await rendered.user.click(await screen.findByRole('tab', { name: 'Cost report' }));
  return rendered;
}

describe('Job cost report', () => {
  it('waits for its tab before asking for the report; the budget shows with money', async () => {
    setAccessToken('t');
    const server = mockApi({ [routes.job]: json(job), [routes.report]: json(buildReport()) });
    renderWithProviders(
      <JobPage
        id={ID}
        access={{ money: true, schedule: true, close: true }}
        logHref={(id, date) => `/jobs/${id}/log/${date}`}
      />,
    );
    await screen.findByRole('tab', { name: 'Cost report' });
    // The budget shows with money for an owner.
    expect(screen.getByLabelText('Budgeted cost')).toHaveTextContent('$889.28');
    expect(server.callsTo(routes.report)).toHaveLength(0);
  });

  it('shows totals, tables and the chart of estimated against actual by category', async () => {
    setAccessToken('t');
    mockApi({ [routes.job]: json(job), [routes.report]: json(buildReport()) });
    await openReport();

    const totals = await screen.findByRole('region', { name: 'Totals' });
    expect(within(totals).getByLabelText('Sold for (before tax)')).toHaveTextContent('$1,183.79');
    expect(within(totals).getByLabelText('Actual cost')).toHaveTextContent('$1,011.56');
    expect(within(totals).getByLabelText('Quoted margin')).toHaveTextContent('24.88 %');
    const realised = within(totals).getByLabelText('Realised margin');
    expect(realised).toHaveTextContent('14.55 %');
    expect(realised).toHaveStyle({ color: 'var(--mantine-color-red-7)' });
    expect(realised).not.toHaveStyle({ color: 'var(--mantine-color-reed-7)' });
    expect(within(totals).getByText(/kept less of the price than the quote planned/)).toBeVisible();

    const labor = screen.getByRole('table', { name: 'Labor' });
    const dig = within(labor).getByText('Excavation').closest('tr')!;
    expect(within(dig).getByText('16')).toBeInTheDocument();
    expect(within(dig).getByText('19.5')).toBeInTheDocument();
    expect(within(dig).getByText('$586.56')).toBeInTheDocument();

    const materials = screen.getByRole('table', { name: 'Materials' });
    const liner = within(materials).getByText('EPDM liner, 45 mil').closest('tr')!;
    expect([...liner.querySelectorAll('td')].map((cell) => cell.textContent)).toEqual([
      'EPDM liner, 45 milLINER-45',
      'sq ft',
      '480',
      '500',
      '470',
      '0',
      '30',
      '$408.00',
      '$425.00',
    ]);
    expect(
      within(screen.getByRole('table', { name: 'Equipment' })).getByText('$975.00'),
    ).toBeVisible();
    expect(screen.getByText('No disposal in the budget or the logs.')).toBeInTheDocument();
    const other = screen.getByRole('table', { name: 'Other costs' });
    expect(within(other).getByText('Mobilization')).toBeInTheDocument();
    const people = screen.getByRole('table', { name: 'Hours by person' });
    expect(within(people).getByText('11.25')).toBeInTheDocument();
    const schedule = screen.getByRole('table', { name: 'Schedule' });
    expect(within(schedule).getByText('3.0')).toBeInTheDocument();
    expect(within(schedule).getByText('4')).toBeInTheDocument();
    expect(screen.getByText(/Two deliveries have no unit cost/)).toBeInTheDocument();

    const points = JSON.parse(
      screen.getByTestId('bar-chart-estimated,actual').dataset.points ?? '[]',
    ) as unknown[];
    expect(points).toEqual([
      { category: 'Materials', estimated: 408, actual: 425 },
      { category: 'Labor', estimated: 481.28, actual: 586.56 },
    ]);
  });

  it('shows disposal logged in loads in the budget’s yd³, with the loads counted', async () => {
    setAccessToken('t');
    const note =
      "Haul-off: 3 loads logged count as 30 cu yd (3 × 10 yd³), at each truck's or container's nominal capacity; a load is rarely filled exactly, so this can overstate what was hauled.";
    const report = buildReport({
      disposal: [
        {
          key: 'code:haul|cu yd',
          code: 'HAUL',
          description: 'Haul-off',
          unit: 'cu yd',
          budgeted: true,
          estimatedQuantity: '27',
          actualQuantity: '30',
          loggedLoads: '3',
          budgetUnitCost: '38.00',
          estimatedCost: '1026.00',
          actualCost: '1140.00',
          variance: '114.00',
        },
      ],
      notes: [note],
    });
    mockApi({ [routes.job]: json(job), [routes.report]: json(report) });
    await openReport();

    const disposal = await screen.findByRole('table', { name: 'Disposal' });
    const haul = within(disposal).getByText('Haul-off').closest('tr')!;
    expect([...haul.querySelectorAll('td')].map((cell) => cell.textContent)).toEqual([
      'Haul-offHAUL',
      'cu yd',
      '27',
      '30from 3 loads',
      '$1,026.00',
      '$1,140.00',
    ]);
    expect(screen.getByText(note)).toBeInTheDocument();
  });

  it('colours the realised margin as good when the job did at least as well as quoted', async () => {
    setAccessToken('t');
    const report = buildReport();
    report.totals = { ...report.totals, actualMarginPct: '26.10' };
    mockApi({ [routes.job]: json(job), [routes.report]: json(report) });
    await openReport();

    const realised = await screen.findByLabelText('Realised margin');
    expect(realised).toHaveStyle({ color: 'var(--mantine-color-reed-7)' });
    expect(screen.queryByText(/kept less of the price/)).toBeNull();
  });

  it('downloads the CSV with the bearer token', async () => {
    setAccessToken('t');
    URL.createObjectURL = vi.fn(() => 'blob:report');
    URL.revokeObjectURL = () => {};
    const downloads: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      downloads.push(`${this.download} ${this.href}`);
    });
    const server = mockApi({
      [routes.job]: json(job),
      [routes.report]: json(buildReport()),
      [routes.csv]: new Response('section,code\r\n', {
        headers: {
          'Content-Type': 'text/csv',
          'Content-Disposition': 'attachment; filename="job-12-cost-report.csv"',
        },
      }),
    });
    const { user } = await openReport();

    await user.click(await screen.findByRole('button', { name: 'Download CSV' }));

    await waitFor(() => expect(click).toHaveBeenCalled());
    expect(downloads).toEqual(['job-12-cost-report.csv blob:report']);
    const request = server.callsTo(routes.csv)[0];
    expect(request?.headers.authorization).toBe('Bearer t');
    expect(request?.headers.accept).toBe('text/csv');
  });
});
