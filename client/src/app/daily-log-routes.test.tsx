import { act, screen, waitFor, within } from '@testing-library/react';
import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { outboxSync } from '@/features/daily-log/sync/outbox-sync';
import {
  buildBudget,
  buildCrewJob,
  buildListItem,
  buildLog,
  JOB_ID,
} from '@/features/daily-log/testing/build-job';
import { addDays, todayIsoDate } from '@/features/daily-log/utils/dates';
import { buildCurrentUser } from '@/testing/factories';
import { apiError, json, mockApi, type RecordedRequest } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });
const DAY = '2026-03-04';
const LOG_URL = `/jobs/${JOB_ID}/log/${DAY}`;
const OUTBOX = 'pondwright.daily-log.outbox.';

function signedIn(extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(crewLead),
    [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob()),
    ...extra,
  });
}

/** What the server stores for a PUT: the body under the path's id, at the given revision. */
function stored(request: RecordedRequest, revision: number): DailyLogView {
  const body = request.body as SaveDailyLogRequest;
  return buildLog({
    id: request.path.split('/').at(-1)!,
    logDate: body.logDate,
    notes: body.notes,
    entries: body.entries,
    revision,
  });
}

/** The log's id, made on the phone and kept with the typing from the first keystroke. */
function typedLogId(): string {
  const key = Object.keys(window.localStorage).find((k) => k.includes('.draft.'));
  return (JSON.parse(window.localStorage.getItem(key!)!) as { logId: string }).logId;
}

const outboxKeys = () => Object.keys(window.localStorage).filter((k) => k.startsWith(OUTBOX));
const status = () => screen.getByRole('status', { name: 'Log status' });
const putPath = (logId: string) => `PUT /api/jobs/${JOB_ID}/logs/${logId}`;

async function typeHoursRow(user: ReturnType<typeof renderApp>['user'], hours = '7.5') {
  await user.click(await screen.findByRole('button', { name: 'Add hours' }));
  const row = screen.getByRole('group', { name: 'Hours 1' });
  await user.type(within(row).getByLabelText('Person'), 'Rowan Vale');
  await user.selectOptions(within(row).getByLabelText('Task'), 'Excavation');
  await user.type(within(row).getByLabelText('Hours'), hours);
}

describe('the daily log', () => {
  beforeEach(() => outboxSync.reset());

  it('keeps a log made offline on the phone and sends it once, under the same id, when back online', async () => {
    const onLine = vi.spyOn(window.navigator, 'onLine', 'get').mockReturnValue(false);
    const server = signedIn();
    const { user } = renderApp(LOG_URL);

    await typeHoursRow(user);
    await user.click(screen.getByRole('button', { name: 'Add delivered material' }));
    const material = screen.getByRole('group', { name: 'Material 1' });
    await user.selectOptions(within(material).getByLabelText('Material'), 'River gravel (tons)');
    await user.type(within(material).getByLabelText('Quantity'), '3');
    await user.type(within(material).getByLabelText('Unit cost on the ticket'), '68,50');
    await user.type(within(material).getByLabelText('Supplier'), 'Creekside Stone');
    await user.type(within(material).getByLabelText('Ticket number'), 'T-4471');
    const logId = typedLogId();
    server.set(putPath(logId), (request) => json(stored(request, 1), 201));

    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    expect(
      await screen.findByText('Waiting to send', { selector: '.mantine-Badge-label' }),
    ).toBeInTheDocument();
    expect(status()).toHaveTextContent('Waiting to send');
    expect(screen.getByRole('button', { name: '1 log not sent yet' })).toBeInTheDocument();
    expect(outboxKeys()).toEqual([OUTBOX + logId]);
    expect(server.callsTo(putPath(logId))).toHaveLength(0);

    onLine.mockReturnValue(true);
    act(() => {
      window.dispatchEvent(new Event('online'));
      window.dispatchEvent(new Event('online'));
    });
    await waitFor(() => expect(status()).toHaveTextContent('Saved'));
    expect(server.callsTo(putPath(logId))).toHaveLength(1);
    expect(server.callsTo(putPath(logId))[0]?.body).toEqual({
      logDate: DAY,
      notes: '',
      baseRevision: 0,
      entries: [
        {
          id: expect.stringMatching(/^[0-9a-f-]{36}$/),
          kind: 'hours',
          person: 'Rowan Vale',
          task: 'excavation',
          hours: '7.5',
        },
        {
          id: expect.stringMatching(/^[0-9a-f-]{36}$/),
          kind: 'material',
          movement: 'delivered',
          code: 'GRAVEL-RIVER',
          description: 'River gravel',
          quantity: '3',
          unit: 'short ton',
          unitCost: '68.50',
          supplier: 'Creekside Stone',
          ticketNumber: 'T-4471',
        },
      ],
    });
    expect(outboxKeys()).toEqual([]);
    expect(screen.queryByRole('button', { name: /not sent yet/ })).not.toBeInTheDocument();
  });

  it('tries again after a network error with the same log id and the same body', async () => {
    const server = signedIn();
    const { user } = renderApp(LOG_URL);
    await typeHoursRow(user, '8');
    const logId = typedLogId();
    let calls = 0;
    server.set(putPath(logId), (request) => {
      calls += 1;
      if (calls === 1) throw new TypeError('Failed to fetch');
      return json(stored(request, 1), 201);
    });

    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    await waitFor(() => expect(status()).toHaveTextContent('Waiting to send'));
    expect(outboxKeys()).toHaveLength(1);

    await user.click(screen.getByRole('button', { name: '1 log not sent yet' }));
    await user.click(await screen.findByRole('button', { name: 'Send now' }));
    await waitFor(() => expect(status()).toHaveTextContent('Saved'));

    const [first, second] = server.callsTo(putPath(logId));
    expect(second?.body).toEqual(first?.body);
    expect(server.callsTo(putPath(logId))).toHaveLength(2);
    expect(outboxKeys()).toEqual([]);
  });

  it('shows both versions on a conflict; "Keep mine" sends mine again on the stored revision', async () => {
    const mine = buildLog();
    const theirs = buildLog({
      revision: 3,
      notes: 'Rain after lunch.',
      authorName: 'Olive Owner',
      entries: [{ ...mine.entries[0]!, hours: '4' } as DailyLogView['entries'][number]],
    });
    const server = signedIn({
      [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob({ logs: [mine] })),
      [`GET /api/jobs/${JOB_ID}/logs`]: json([theirs]),
    });
    server.set(putPath(mine.id), (request) =>
      (request.body as SaveDailyLogRequest).baseRevision === 3
        ? json(stored(request, 4))
        : json(
            {
              statusCode: 409,
              error: 'Conflict',
              message: 'This log changed since you opened it',
              code: 'LOG_CONFLICT',
              current: theirs,
            },
            409,
          ),
    );
    const { user } = renderApp(LOG_URL);

    const hours = within(await screen.findByRole('group', { name: 'Hours 1' })).getByLabelText(
      'Hours',
    );
    expect(hours).toHaveValue('6');
    await user.clear(hours);
    await user.type(hours, '7');
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));

    expect(await screen.findByText('Two versions of this day’s log')).toBeInTheDocument();
    expect(status()).toHaveTextContent('Conflict');
    const yours = await screen.findByRole('region', { name: 'Your version' });
    const saved = screen.getByRole('region', { name: 'Saved version' });
    await waitFor(() => expect(saved).toHaveTextContent('Rowan Vale: 4 h, Excavation'));
    expect(yours).toHaveTextContent('Rowan Vale: 7 h, Excavation');
    expect(saved).toHaveTextContent('Rain after lunch.');
    expect(saved).toHaveTextContent('Saved by Olive Owner');
    expect(outboxKeys()).toHaveLength(1);

    await user.click(screen.getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(status()).toHaveTextContent('Saved'));
    const puts = server.callsTo(putPath(mine.id));
    expect(puts.map((put) => (put.body as SaveDailyLogRequest).baseRevision)).toEqual([2, 3]);
    expect((puts[1]?.body as SaveDailyLogRequest).entries[0]).toMatchObject({ hours: '7' });
    expect(screen.queryByText('Two versions of this day’s log')).not.toBeInTheDocument();
    expect(outboxKeys()).toEqual([]);
  });

  it('"Use the saved one" drops this phone’s copy and opens the stored log', async () => {
    const mine = buildLog();
    const theirs = buildLog({ revision: 3, notes: 'Rain after lunch.' });
    const server = signedIn({
      [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob({ logs: [mine] })),
      [`GET /api/jobs/${JOB_ID}/logs`]: json([theirs]),
      [putPath(mine.id)]: json(
        { statusCode: 409, error: 'Conflict', message: 'Changed', code: 'LOG_CONFLICT' },
        409,
      ),
    });
    const { user } = renderApp(LOG_URL);
    await user.type(await screen.findByLabelText(/^Notes/), ' Mine.');
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    await user.click(await screen.findByRole('button', { name: 'Use the saved one' }));

    await waitFor(() => expect(screen.getByLabelText(/^Notes/)).toHaveValue('Rain after lunch.'));
    expect(status()).toHaveTextContent('Saved');
    expect(outboxKeys()).toEqual([]);
    expect(server.callsTo(putPath(mine.id))).toHaveLength(1);
  });

  it('puts the server’s field message on the field and keeps the log, also after a reload', async () => {
    const server = signedIn();
    const first = renderApp(LOG_URL);
    await typeHoursRow(first.user);
    const logId = typedLogId();
    server.set(
      putPath(logId),
      apiError(400, 'Nobody of that name is on the team', [
        { field: 'entries.0.person', message: 'Nobody of that name is on the team' },
      ]),
    );
    await first.user.click(screen.getByRole('button', { name: 'Save the day’s log' }));

    const person = within(screen.getByRole('group', { name: 'Hours 1' })).getByLabelText('Person');
    await waitFor(() =>
      expect(person).toHaveAccessibleDescription('Nobody of that name is on the team'),
    );
    expect(status()).toHaveTextContent('Needs a fix');
    expect(screen.getByText('The log was not accepted')).toBeInTheDocument();
    first.unmount();

    renderApp(LOG_URL);
    const again = within(await screen.findByRole('group', { name: 'Hours 1' })).getByLabelText(
      'Person',
    );
    expect(again).toHaveValue('Rowan Vale');
    await waitFor(() =>
      expect(again).toHaveAccessibleDescription('Nobody of that name is on the team'),
    );
    expect(server.callsTo(putPath(logId))).toHaveLength(1);
  });

  it('checks the rows on the phone before anything is queued', async () => {
    const server = signedIn();
    const { user } = renderApp(LOG_URL);
    await user.click(await screen.findByRole('button', { name: 'Add hours' }));
    const row = screen.getByRole('group', { name: 'Hours 1' });
    await user.type(within(row).getByLabelText('Hours'), '30');
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));

    await waitFor(() =>
      expect(within(row).getByLabelText('Hours')).toHaveAccessibleDescription('At most 24 hours'),
    );
    expect(within(row).getByLabelText('Person')).toHaveAccessibleDescription('Who worked?');
    expect(within(row).getByLabelText('Task')).toHaveAccessibleDescription('Choose a task');
    expect(outboxKeys()).toEqual([]);
    expect(server.requests.filter((request) => request.method === 'PUT')).toEqual([]);
  });

  it('keeps unsaved typing through a reload', async () => {
    signedIn();
    const first = renderApp(LOG_URL);
    await typeHoursRow(first.user);
    await first.user.type(screen.getByLabelText(/^Notes/), 'Liner arrives tomorrow.');
    first.unmount();

    renderApp(LOG_URL);
    const row = await screen.findByRole('group', { name: 'Hours 1' });
    expect(within(row).getByLabelText('Hours')).toHaveValue('7.5');
    expect(screen.getByLabelText(/^Notes/)).toHaveValue('Liner arrives tomorrow.');
    expect(status()).toHaveTextContent('Not saved yet');
  });

  it('shows the plan in quantities only, even to an owner whose job carries money', async () => {
    const owner = buildCurrentUser({ role: 'owner' });
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(owner),
      [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob({ budget: buildBudget(), crewBudget: [] })),
    });
    const { user } = renderApp(LOG_URL);
    await user.click(await screen.findByRole('button', { name: 'The job’s plan' }));

    const materials = await screen.findByRole('list', { name: 'Materials' });
    expect(materials).toHaveTextContent('River gravel: 3.2 tons');
    expect(screen.getByRole('list', { name: 'Hours' })).toHaveTextContent('Excavation: 14.00 h');
    expect(screen.getByRole('list', { name: 'Disposal' })).toHaveTextContent('Haul-off: 6.5 yd³');
    for (const money of ['$', '68.00', '325.00', '2545.08', '589.57']) {
      expect(document.body).not.toHaveTextContent(money);
    }
    const kept = Object.keys(window.localStorage).filter((key) => key.includes('.copy.'));
    expect(kept).toHaveLength(1);
    expect(window.localStorage.getItem(kept[0]!)).not.toContain('68.00');
  });

  it('asks for a sign-in, and keeps the logs, when the session ends while they wait', async () => {
    const server = signedIn({
      'POST /api/auth/refresh': [json({ accessToken: 'restored' }), apiError(401, 'No session')],
    });
    const logId = '44444444-4444-4444-8444-444444444444';
    outboxSync.save({
      logId,
      jobId: JOB_ID,
      userId: crewLead.id,
      jobLabel: '#12 Koi pond with stream',
      request: { logDate: DAY, notes: 'Kept.', entries: [], baseRevision: 0 },
    });
    server.set(putPath(logId), apiError(401, 'Token expired'));
    renderApp('/');

    expect(await screen.findByText(/Sign in again to send 1 waiting log\./)).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(outboxKeys()).toEqual([OUTBOX + logId]);
  });

  it('opens today’s log from /jobs/:id/log', async () => {
    signedIn();
    const { router } = renderApp(`/jobs/${JOB_ID}/log`);
    await screen.findByRole('button', { name: 'Save the day’s log' });
    expect(router.state.location.pathname).toMatch(
      new RegExp(`/jobs/${JOB_ID}/log/\\d{4}-\\d{2}-\\d{2}$`),
    );
  });

  it('opens the job from the phone’s copy when there is no connection', async () => {
    const server = signedIn();
    const first = renderApp(LOG_URL);
    expect(
      await first.findByRole('heading', { name: '#12 Koi pond with stream' }),
    ).toBeInTheDocument();
    first.unmount();

    server.set(`GET /api/jobs/${JOB_ID}`, () => {
      throw new TypeError('Failed to fetch');
    });
    const { user } = renderApp(LOG_URL);
    expect(
      await screen.findByRole('heading', { name: '#12 Koi pond with stream' }),
    ).toBeInTheDocument();
    expect(
      screen.getByText(/No connection: the job as this phone last saw it/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add used material' }));
    expect(
      within(screen.getByRole('group', { name: 'Material 1' })).getByRole('option', {
        name: 'River gravel (tons)',
      }),
    ).toBeInTheDocument();
  });

  it('lists a crew lead’s jobs for today and the days ahead, their crew first', async () => {
    const today = todayIsoDate();
    const underWay = buildListItem({
      plannedStart: addDays(today, -1),
      plannedEnd: addDays(today, 1),
    });
    const next = buildListItem({
      id: 'job-next',
      number: 14,
      title: 'Wildlife pond',
      status: 'scheduled',
      plannedStart: addDays(today, 3),
      plannedEnd: addDays(today, 4),
    });
    const otherCrew = buildListItem({
      id: 'job-other',
      number: 15,
      title: 'Patio fountain',
      status: 'scheduled',
      crewId: 'crew-2',
      crewName: 'South crew',
      plannedStart: today,
      plannedEnd: today,
    });
    const server = signedIn({
      // Under way first, then scheduled: the two are asked for in that order.
      'GET /api/jobs': [json([underWay]), json([next, otherCrew])],
      'GET /api/crews': json([
        { id: 'crew-1', name: 'North crew', leadUserId: crewLead.id, leadName: 'Cal Crewlead' },
        { id: 'crew-2', name: 'South crew', leadUserId: null, leadName: null },
      ]),
    });
    const { user } = renderApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    await user.click(within(nav).getByRole('link', { name: /My jobs/ }));

    const todays = await screen.findByRole('region', { name: 'Today' });
    const card = within(todays).getByRole('article', { name: '#12 Koi pond with stream' });
    expect(within(card).getByRole('link', { name: 'Today’s log' })).toHaveAttribute(
      'href',
      `/jobs/${JOB_ID}/log/${today}`,
    );
    expect(
      within(screen.getByRole('region', { name: 'Coming up' })).getByRole('article', {
        name: '#14 Wildlife pond',
      }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('article', { name: '#15 Patio fountain' })).not.toBeInTheDocument();

    await user.click(screen.getByRole('radio', { name: 'All crews' }));
    expect(within(todays).getByRole('article', { name: '#15 Patio fountain' })).toBeInTheDocument();

    const asked = server.fetch.mock.calls
      .map(([input]) => new URL(String(input), 'http://localhost'))
      .filter((url) => url.pathname === '/api/jobs');
    expect(asked.map((url) => url.searchParams.get('status'))).toEqual([
      'in_progress',
      'scheduled',
    ]);
    expect(asked[0]?.searchParams.get('to')).toBe(addDays(today, 14));
  });

  it('offers "My jobs" in the navigation to crew leads only', async () => {
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(buildCurrentUser({ role: 'estimator' })),
    });
    renderApp('/');
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Home' })).toBeInTheDocument();
    expect(within(nav).queryByRole('link', { name: /My jobs/ })).not.toBeInTheDocument();
  });
});
