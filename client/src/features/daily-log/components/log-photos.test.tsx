import 'fake-indexeddb/auto';
import { act, screen, waitFor, within } from '@testing-library/react';
import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { json, mockApi, type RecordedRequest } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';
import { clearQueuedPhotos, readQueuedPhotos } from '../storage/photo-store';
import { outboxSync } from '../sync/outbox-sync';
import { photoSync } from '../sync/photo-sync';
import { buildCrewJob, buildLog, JOB_ID } from '../testing/build-job';
import { FakeXhr, formFields, stubXhr } from '@/testing/fake-xhr';

const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });
const DAY = '2026-03-04';
const LOG_URL = `/jobs/${JOB_ID}/log/${DAY}`;
const JPEG_START = [0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01];
const jpeg = (name: string) =>
  new File([new Uint8Array([...JPEG_START, 1, 2, 3])], name, { type: 'image/jpeg' });

function signedIn() {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(crewLead),
    [`GET /api/jobs/${JOB_ID}`]: json(buildCrewJob()),
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

async function typeHoursRow(user: User) {
  await user.click(await screen.findByRole('button', { name: 'Add hours' }));
  const row = screen.getByRole('group', { name: 'Hours 1' });
  await user.type(within(row).getByLabelText('Person'), 'Rowan Vale');
  await user.selectOptions(within(row).getByLabelText('Task'), 'Excavation');
  await user.type(within(row).getByLabelText('Hours'), '8');
}

/** Found once the photo's bytes are checked and stored, which takes a moment on a busy machine. */
const photoList = () => screen.findByRole('list', { name: 'Photos not sent yet' });

/** jsdom has no object URLs; the stand-ins are removed again after each test. */
const realObjectUrls = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };

describe('photos in the daily log', () => {
  beforeEach(async () => {
    outboxSync.reset();
    photoSync.reset();
    await clearQueuedPhotos();
    stubXhr();
    let count = 0;
    URL.createObjectURL = () => `blob:log-photo-${++count}`;
    URL.revokeObjectURL = () => {};
  });
  afterEach(() => {
    URL.createObjectURL = realObjectUrls.create;
    URL.revokeObjectURL = realObjectUrls.revoke;
  });

  it('keeps a photo taken offline through a reload and sends it once, under its id, after the log', async () => {
    const onLine = vi.spyOn(window.navigator, 'onLine', 'get').mockReturnValue(false);
    const server = signedIn();
    const first = renderApp(LOG_URL);
    await typeHoursRow(first.user);
    await first.user.upload(screen.getByLabelText('Photos from this phone'), jpeg('pond.jpg'));

    expect(await within(await photoList()).findByText('Waiting to send')).toBeInTheDocument();
    const [queued] = await readQueuedPhotos();
    expect(queued).toMatchObject({ logId: typedLogId(), kind: 'progress', status: 'waiting' });
    expect(await screen.findByRole('button', { name: '1 photo not sent yet' })).toBeInTheDocument();

    // A reload: the page and the sender's memory are gone, the phone's storage is not.
    first.unmount();
    photoSync.reset();
    const { user, queryClient } = renderApp(LOG_URL);
    const invalidate = vi.spyOn(queryClient, 'invalidateQueries');
    expect(
      await within(await screen.findByRole('list', { name: 'Photos not sent yet' })).findByRole(
        'img',
      ),
    ).toHaveAttribute('src', 'blob:log-photo-2');
    server.set(`PUT /api/jobs/${JOB_ID}/logs/${queued!.logId}`, (request) =>
      json(stored(request), 201),
    );
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    expect(
      await screen.findByRole('button', { name: '1 log, 1 photo not sent yet' }),
    ).toBeInTheDocument();
    expect(FakeXhr.sent).toHaveLength(0);

    onLine.mockReturnValue(true);
    act(() => window.dispatchEvent(new Event('online')));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    const [xhr] = FakeXhr.sent;
    expect(xhr!.method).toBe('PUT');
    expect(xhr!.url).toBe(`/api/jobs/${JOB_ID}/photos/${queued!.id}`);
    expect(xhr!.headers.authorization).toBe('Bearer restored');
    expect(formFields(xhr!.body)).toMatchObject({
      kind: 'progress',
      caption: '',
      logId: queued!.logId,
    });
    await xhr!.respond(201, { id: queued!.id });

    await waitFor(() =>
      expect(screen.queryByRole('list', { name: 'Photos not sent yet' })).not.toBeInTheDocument(),
    );
    expect(await readQueuedPhotos()).toEqual([]);
    // The office's photo list of the job reloads with the new photo.
    expect(invalidate).toHaveBeenCalledWith({ queryKey: ['jobs', 'photos', JOB_ID] });
    act(() => window.dispatchEvent(new Event('online')));
    await waitFor(() =>
      expect(screen.queryByRole('button', { name: /not sent yet/ })).not.toBeInTheDocument(),
    );
    expect(FakeXhr.sent).toHaveLength(1);
  });

  it('refuses a program renamed .jpg by its first bytes, keeping nothing', async () => {
    signedIn();
    const { user } = renderApp(LOG_URL);
    const program = new File(
      [new Uint8Array([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00, 0x04, 0x00, 0x00, 0x00])],
      'pond.jpg',
      { type: 'image/jpeg' },
    );
    await user.upload(await screen.findByLabelText('Photos from this phone'), program);

    expect(await screen.findByRole('alert')).toHaveTextContent(
      '“pond.jpg” is not a JPEG, PNG or WebP photo. Its contents are not an image, whatever its name says.',
    );
    expect(await readQueuedPhotos()).toEqual([]);
    expect(FakeXhr.sent).toHaveLength(0);
  });

  it('marks a photo the server finds too large as not accepted, with its message, until removed', async () => {
    const server = signedIn();
    const { user } = renderApp(LOG_URL);
    await typeHoursRow(user);
    server.set(`PUT /api/jobs/${JOB_ID}/logs/${typedLogId()}`, (request) =>
      json(stored(request), 201),
    );
    await user.click(screen.getByRole('button', { name: 'Save the day’s log' }));
    await waitFor(() =>
      expect(screen.getByRole('status', { name: 'Log status' })).toHaveTextContent('Saved'),
    );

    await user.upload(screen.getByLabelText('Photos from this phone'), jpeg('big.jpg'));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    const message = 'The photo is larger than 15 MB. Take it again at a lower size.';
    await FakeXhr.sent[0]!.respond(413, {
      statusCode: 413,
      error: 'Payload Too Large',
      message,
      code: 'PHOTO_TOO_LARGE',
    });

    expect(await within(await photoList()).findByRole('alert')).toHaveTextContent(
      `Not accepted: ${message}`,
    );
    expect(await readQueuedPhotos()).toMatchObject([{ status: 'failed', message }]);
    await user.click(within(await photoList()).getByRole('button', { name: 'Remove Progress' }));
    await waitFor(async () => expect(await readQueuedPhotos()).toEqual([]));
    expect(FakeXhr.sent).toHaveLength(1);
  });

  it('adds a delivery’s ticket photo as a ticket, captioned with its number', async () => {
    vi.spyOn(window.navigator, 'onLine', 'get').mockReturnValue(false);
    signedIn();
    const { user } = renderApp(LOG_URL);
    await user.click(await screen.findByRole('button', { name: 'Add delivered material' }));
    const row = screen.getByRole('group', { name: 'Material 1' });
    await user.type(within(row).getByLabelText('Ticket number'), 'T-4471');
    expect(within(row).getByRole('button', { name: 'Ticket photo' })).toBeInTheDocument();
    await user.upload(
      within(row).getByLabelText('Ticket photo from the camera'),
      jpeg('ticket.jpg'),
    );

    expect(
      await within(await photoList()).findByText('Ticket · Ticket T-4471'),
    ).toBeInTheDocument();
    expect(await readQueuedPhotos()).toMatchObject([
      { kind: 'ticket', caption: 'Ticket T-4471', logId: typedLogId(), status: 'waiting' },
    ]);
  });
});
