import { screen, waitFor, within } from '@testing-library/react';
import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { beforeEach, describe, expect, it } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { json, mockApi, type RecordedRequest } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';
import { outboxSync } from '../sync/outbox-sync';
import { buildCrewJob, buildLog, JOB_ID } from '../testing/build-job';

const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });
const DAY = '2026-03-04';
const LOG_URL = `/jobs/${JOB_ID}/log/${DAY}`;
const LOAD_SIZE = 'Load size (loose yd³)';

/** Yesterday's log, when the crew hauled in a 12 yd³ truck. */
const yesterday = buildLog({
  id: '7e2a4c61-3b5d-4f8e-9a10-2c4d6e8f0a13',
  logDate: '2026-03-03',
  entries: [
    {
      id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f',
      kind: 'disposal',
      movement: null,
      code: 'HAUL',
      description: 'Haul-off',
      quantity: '2',
      unit: 'load',
      unitCost: null,
      supplier: null,
      ticketNumber: null,
      loadVolumeLooseCubicYards: '12',
    },
  ],
});

function signedIn(job = buildCrewJob()) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(crewLead),
    [`GET /api/jobs/${JOB_ID}`]: json(job),
  });
}

function stored(request: RecordedRequest): DailyLogView {
  const body = request.body as SaveDailyLogRequest;
  return buildLog({ id: request.path.split('/').at(-1)!, ...body, revision: 1 });
}

function typedLogId(): string {
  const key = Object.keys(window.localStorage).find((k) => k.includes('.draft.'));
  return (JSON.parse(window.localStorage.getItem(key!)!) as { logId: string }).logId;
}

type User = ReturnType<typeof renderApp>['user'];

/** Adds a disposal row against the plan's haul-off (in yd³) and counts it in loads. */
async function addHaulInLoads(user: User) {
  await user.click(await screen.findByRole('button', { name: 'Add disposal' }));
  const row = screen.getByRole('group', { name: 'Disposal 1' });
  await user.selectOptions(within(row).getByLabelText('Disposal'), 'Haul-off (yd³)');
  expect(within(row).queryByLabelText(LOAD_SIZE)).not.toBeInTheDocument();
  await user.selectOptions(within(row).getByLabelText('Unit'), 'loads');
  await user.type(within(row).getByLabelText('Loads'), '3');
  return row;
}

describe('the load size of disposal counted in loads', () => {
  beforeEach(() => outboxSync.reset());

  it('starts at the size last logged on the job, says loads count as full, and is sent with the log', async () => {
    const server = signedIn(buildCrewJob({ logs: [yesterday] }));
    const { user } = renderApp(LOG_URL);
    const row = await addHaulInLoads(user);

    const size = within(row).getByLabelText(LOAD_SIZE);
    expect(size).toHaveValue('12');
    expect(size).toHaveAccessibleDescription(/capacity.*Each load counts as full/);
    // A crew lead sees quantities, never money.
    expect(document.body).not.toHaveTextContent('$');

    await user.clear(size);
    await user.type(size, '10,5');
    const logId = typedLogId();
    server.set(`PUT /api/jobs/${JOB_ID}/logs/${logId}`, (request) => json(stored(request), 201));
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));

    await waitFor(() =>
      expect(server.callsTo(`PUT /api/jobs/${JOB_ID}/logs/${logId}`)).toHaveLength(1),
    );
    const body = server.callsTo(`PUT /api/jobs/${JOB_ID}/logs/${logId}`)[0]!
      .body as SaveDailyLogRequest;
    expect(body.entries).toEqual([
      {
        id: expect.stringMatching(/^[0-9a-f-]{36}$/),
        kind: 'disposal',
        movement: null,
        code: 'HAUL',
        description: 'Haul-off',
        quantity: '3',
        unit: 'load',
        unitCost: null,
        supplier: null,
        ticketNumber: null,
        loadVolumeLooseCubicYards: '10.5',
      },
    ]);
  });

  it('remembers the size on the phone for the next log of any job', async () => {
    const server = signedIn();
    const first = renderApp(LOG_URL);
    const row = await addHaulInLoads(first.user);
    // Nothing logged on the job and nothing kept on the phone yet: the crew sizes the first load.
    expect(within(row).getByLabelText(LOAD_SIZE)).toHaveValue('');
    await first.user.type(within(row).getByLabelText(LOAD_SIZE), '6');
    const logId = typedLogId();
    server.set(`PUT /api/jobs/${JOB_ID}/logs/${logId}`, (request) => json(stored(request), 201));
    await first.user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    await waitFor(() =>
      expect(server.callsTo(`PUT /api/jobs/${JOB_ID}/logs/${logId}`)).toHaveLength(1),
    );
    first.unmount();

    const next = renderApp(`/jobs/${JOB_ID}/log/2026-03-05`);
    const again = await addHaulInLoads(next.user);
    expect(within(again).getByLabelText(LOAD_SIZE)).toHaveValue('6');
  });

  it('asks for a size more than 0 and at most 40 yd³ before anything is queued', async () => {
    const server = signedIn();
    const { user } = renderApp(LOG_URL);
    const row = await addHaulInLoads(user);
    const size = within(row).getByLabelText(LOAD_SIZE);
    const save = () => user.click(screen.getByRole('button', { name: 'Save the day’s log' }));

    await save();
    await waitFor(() =>
      expect(size).toHaveAccessibleDescription(/Enter the load size in loose yd³, such as 10/),
    );
    await user.type(size, '45');
    await save();
    await waitFor(() =>
      expect(size).toHaveAccessibleDescription(
        /At most 40 yd³ a load \(the largest roll-off container\)/,
      ),
    );
    await user.clear(size);
    await user.type(size, '0');
    await save();
    await waitFor(() => expect(size).toHaveAccessibleDescription(/A load holds more than 0 yd³/));
    expect(server.requests.filter((request) => request.method === 'PUT')).toEqual([]);
  });
});
