import { act, screen, waitFor, within } from '@testing-library/react';
import type { SaveDailyLogRequest } from '@pondwright/shared';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setOpenedOffline } from '@/features/auth/session/offline-session';
import { outboxSync } from '@/features/daily-log/sync/outbox-sync';
import { buildCrewJob, buildLog, JOB_ID } from '@/features/daily-log/testing/build-job';
import { clearAccessToken } from '@/lib/api-client';
import { buildCurrentUser } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });
const LOG_URL = `/jobs/${JOB_ID}/log/2026-03-04`;
const REMEMBERED = 'pondwright.session.user';

function online() {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(crewLead),
    [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob()),
  });
}

/** No connection at all: every request fails the way a browser's fetch does with no network. */
function noConnection() {
  const fetchMock = vi.fn(() => Promise.reject(new TypeError('Failed to fetch')));
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** A first visit with a connection: the device remembers the crew lead and keeps a copy of the job. */
async function visitOnce() {
  online();
  const visit = renderApp(LOG_URL);
  await screen.findByRole('button', { name: 'Add hours' });
  visit.unmount();
  // A reload starts with no access token in memory.
  clearAccessToken();
}

const OFFLINE_TITLE = 'No connection: opened from this device';
const offlineBanner = () => screen.queryByRole('status', { name: OFFLINE_TITLE });

describe('opening Pondwright with no connection', () => {
  let onLine: ReturnType<typeof vi.spyOn>;

  beforeEach(() => {
    outboxSync.reset();
    setOpenedOffline(false);
    onLine = vi.spyOn(window.navigator, 'onLine', 'get').mockReturnValue(true);
  });
  afterEach(() => setOpenedOffline(false));

  it('opens the daily log as the person last signed in here, keeps the log, and sends it once when back', async () => {
    await visitOnce();
    expect(JSON.parse(window.localStorage.getItem(REMEMBERED)!)).toMatchObject({
      id: crewLead.id,
      role: 'crew_lead',
    });

    onLine.mockReturnValue(false);
    noConnection();
    const { user } = renderApp(LOG_URL);
    expect(await screen.findByRole('status', { name: OFFLINE_TITLE })).toHaveTextContent(
      'What you log is kept here and sent by itself when the signal returns.',
    );
    await user.click(await screen.findByRole('button', { name: 'Add hours' }));
    const row = screen.getByRole('group', { name: 'Hours 1' });
    await user.type(within(row).getByLabelText('Person'), 'Rowan Vale');
    await user.selectOptions(within(row).getByLabelText('Task'), 'Excavation');
    await user.type(within(row).getByLabelText('Hours'), '6');
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    expect(
      await screen.findByText('Waiting to send', { selector: '.mantine-Badge-label' }),
    ).toBeInTheDocument();

    // The signal returns: the refresh cookie restores the session and the log goes out, once.
    const server = online();
    const draftLogId = Object.keys(window.localStorage)
      .find((key) => key.startsWith('pondwright.daily-log.outbox.'))!
      .split('.')
      .at(-1)!;
    server.set(`PUT /api/jobs/${JOB_ID}/logs/${draftLogId}`, (request) => {
      const body = request.body as SaveDailyLogRequest;
      return json(buildLog({ id: draftLogId, logDate: body.logDate, entries: body.entries }), 201);
    });
    onLine.mockReturnValue(true);
    act(() => {
      window.dispatchEvent(new Event('online'));
    });
    await waitFor(() => expect(offlineBanner()).not.toBeInTheDocument());
    await waitFor(() =>
      expect(server.callsTo(`PUT /api/jobs/${JOB_ID}/logs/${draftLogId}`)).toHaveLength(1),
    );
    expect(server.callsTo('POST /api/auth/refresh').length).toBeGreaterThanOrEqual(1);
  });

  it('cannot open offline for someone who never signed in on this device', async () => {
    noConnection();
    renderApp(LOG_URL);
    expect(await screen.findByText('Pondwright could not start')).toBeInTheDocument();
    expect(offlineBanner()).not.toBeInTheDocument();
  });

  it('forgets the person when the server says the session is over', async () => {
    await visitOnce();
    mockApi({ 'POST /api/auth/refresh': json({ statusCode: 401, message: 'No session' }, 401) });
    const { router } = renderApp(LOG_URL);
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(window.localStorage.getItem(REMEMBERED)).toBeNull();

    // With no connection now, nobody is remembered, so nothing opens as them.
    clearAccessToken();
    noConnection();
    renderApp(LOG_URL);
    expect(await screen.findAllByText('Pondwright could not start')).not.toHaveLength(0);
  });
});
