import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildCrewLeadJob, buildCrews, buildJob, CREW_B } from '../testing/build-job';
import { JobPage, type JobAccess } from './job-page';

const job = buildJob();
const ID = job.id;
const owner: JobAccess = { money: true, schedule: true, close: true };
const crewLead: JobAccess = { money: false, schedule: false, close: false };

function renderJob(access: JobAccess) {
  return renderWithProviders(
    <JobPage id={ID} access={access} logHref={(id, date) => `/jobs/${id}/log/${date}`} />,
  );
}

describe('Job page', () => {
  it('asks why a job that had a start moves, then sends the new plan', async () => {
    setAccessToken('t');
    const moved = {
      ...job,
      plannedStart: '2026-03-10',
      plannedEnd: '2026-03-12',
      crewId: CREW_B,
      crewName: 'Otter crew',
    };
    const server = mockApi({
      [`GET /api/jobs/${ID}`]: json(job),
      'GET /api/crews': json(buildCrews()),
      [`POST /api/jobs/${ID}/schedule`]: json(moved),
    });
    const { user } = renderJob(owner);

    await user.click(await screen.findByRole('button', { name: 'Reschedule' }));
    const dialog = await screen.findByRole('dialog', { name: 'Reschedule the job' });
    const start = within(dialog).getByLabelText(/^Start/);
    expect(start).toHaveValue('2026-03-03');
    expect(within(dialog).getByLabelText(/^Crew days/)).toHaveValue('3');
    await user.clear(start);
    await user.type(start, '2026-03-10');
    await user.click(within(dialog).getByRole('combobox', { name: 'Crew' }));
    await user.click(await screen.findByRole('option', { name: 'Otter crew' }));
    await user.click(within(dialog).getByRole('button', { name: 'Save the new date' }));

    expect(await within(dialog).findByText('Choose a reason')).toBeInTheDocument();
    expect(server.callsTo(`POST /api/jobs/${ID}/schedule`)).toHaveLength(0);

    await user.click(within(dialog).getByRole('combobox', { name: /^Reason/ }));
    await user.click(await screen.findByRole('option', { name: 'Weather' }));
    await user.type(within(dialog).getByLabelText(/^Note/), 'Heavy rain all week');
    await user.click(within(dialog).getByRole('button', { name: 'Save the new date' }));

    await waitFor(() => expect(server.callsTo(`POST /api/jobs/${ID}/schedule`)).toHaveLength(1));
    expect(server.callsTo(`POST /api/jobs/${ID}/schedule`)[0]?.body).toEqual({
      plannedStart: '2026-03-10',
      crewId: CREW_B,
      reason: 'weather',
      note: 'Heavy rain all week',
    });
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(within(screen.getByLabelText('Plan')).getByText('Otter crew')).toBeInTheDocument();
  });

  it('gives a job its first date without a reason', async () => {
    setAccessToken('t');
    const unscheduled = { ...job, plannedStart: null, plannedEnd: null, scheduleChanges: [] };
    const server = mockApi({
      [`GET /api/jobs/${ID}`]: json(unscheduled),
      'GET /api/crews': json(buildCrews()),
      [`POST /api/jobs/${ID}/schedule`]: json(job),
    });
    const { user } = renderJob(owner);

    await user.click(await screen.findByRole('button', { name: 'Schedule' }));
    const dialog = await screen.findByRole('dialog', { name: 'Schedule the job' });
    const start = within(dialog).getByLabelText(/^Start/);
    await user.clear(start);
    await user.type(start, '2026-03-03');
    await user.clear(within(dialog).getByLabelText(/^Crew days/));
    await user.type(within(dialog).getByLabelText(/^Crew days/), '2.5');
    await user.click(within(dialog).getByRole('button', { name: 'Save the new date' }));

    await waitFor(() => expect(server.callsTo(`POST /api/jobs/${ID}/schedule`)).toHaveLength(1));
    expect(server.callsTo(`POST /api/jobs/${ID}/schedule`)[0]?.body).toEqual({
      plannedStart: '2026-03-03',
      crewId: job.crewId,
      plannedCrewDays: '2.5',
    });
  });

  it('shows a crew lead what to build without any money, and no cost report', async () => {
    setAccessToken('t');
    const server = mockApi({
      [`GET /api/jobs/${ID}`]: json(buildCrewLeadJob()),
      [`POST /api/jobs/${ID}/status`]: json(buildCrewLeadJob({ status: 'in_progress' })),
    });
    const { user } = renderJob(crewLead);

    const build = await screen.findByRole('table', { name: 'Materials to build' });
    expect(within(build).getByText('EPDM liner, 45 mil')).toBeInTheDocument();
    expect(within(build).getByText('480 sq ft')).toBeInTheDocument();
    expect(screen.getByRole('tab', { name: 'What to build' })).toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: 'Cost report' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Reschedule|Schedule/ })).toBeNull();
    expect(document.body).not.toHaveTextContent('$');
    expect(server.callsTo(`GET /api/jobs/${ID}/report`)).toHaveLength(0);

    // Starting the job is everyone's to do.
    await user.click(screen.getByRole('button', { name: 'Start job' }));
    const dialog = await screen.findByRole('dialog', { name: 'Start this job?' });
    await user.click(within(dialog).getByRole('button', { name: 'Start job' }));
    await waitFor(() => expect(server.callsTo(`POST /api/jobs/${ID}/status`)).toHaveLength(1));
    expect(server.callsTo(`POST /api/jobs/${ID}/status`)[0]?.body).toEqual({
      status: 'in_progress',
    });
    expect(await screen.findByRole('button', { name: 'Mark complete' })).toBeInTheDocument();
  });

  it('lets only an owner close a completed job', async () => {
    setAccessToken('t');
    mockApi({ [`GET /api/jobs/${ID}`]: json(buildJob({ status: 'completed' })) });
    const first = renderJob({ money: true, schedule: true, close: false });
    expect(await screen.findByText('Completed')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Close job' })).toBeNull();
    first.unmount();

    renderJob(owner);
    expect(await screen.findByRole('button', { name: 'Close job' })).toBeInTheDocument();
  });

  it('lists the daily logs with hours and entries, each linking to its day', async () => {
    setAccessToken('t');
    mockApi({ [`GET /api/jobs/${ID}`]: json(job) });
    const { user } = renderJob(owner);

    await user.click(await screen.findByRole('tab', { name: 'Daily logs (1)' }));
    const logs = await screen.findByRole('table', { name: 'Daily logs' });
    const row = within(logs).getByRole('link', { name: 'Mar 3, 2026' }).closest('tr')!;
    expect(within(logs).getByRole('link', { name: 'Mar 3, 2026' })).toHaveAttribute(
      'href',
      `/jobs/${ID}/log/2026-03-03`,
    );
    expect(within(row).getByText('Cal Crewlead')).toBeInTheDocument();
    // 7.5 + 8.25 hours; the disposal entry counts as an entry, not as hours.
    expect(within(row).getByText('15.75')).toBeInTheDocument();
    expect(within(row).getByText('3')).toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: 'Schedule history' }));
    const history = await screen.findByRole('table', { name: 'Schedule history' });
    expect(within(history).getByText('Olive Owner')).toBeInTheDocument();
    expect(within(history).getByText('Mar 3, 2026')).toBeInTheDocument();
  });
});
