import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError, NetworkError } from '@/lib/api-error';
import { draftKey, readDraft, writeDraft } from '../storage/draft-store';
import { readOutbox, readOutboxItem } from '../storage/outbox-store';
import { buildLog, JOB_ID } from '../testing/build-job';
import { emptyLogValues } from '../utils/log-values';
import { OutboxSync } from './outbox-sync';

const USER = 'user-1';
const LOG_A = '11111111-1111-4111-8111-111111111111';
const LOG_B = '22222222-2222-4222-8222-222222222222';
const ENTRY = '33333333-3333-4333-8333-333333333333';

const request = (baseRevision = 0, hours = '7.5'): SaveDailyLogRequest => ({
  logDate: '2026-03-04',
  notes: '',
  entries: [{ id: ENTRY, kind: 'hours', person: 'Rowan Vale', task: 'excavation', hours }],
  baseRevision,
});

function deferred<T>() {
  let resolve!: (value: T) => void;
  let reject!: (error: unknown) => void;
  const promise = new Promise<T>((res, rej) => {
    resolve = res;
    reject = rej;
  });
  return { promise, resolve, reject };
}

function setup(
  send = vi.fn<
    (jobId: string, logId: string, body: SaveDailyLogRequest) => Promise<DailyLogView>
  >(),
) {
  const loadStored = vi.fn(async () => null as DailyLogView | null);
  let online = true;
  const sync = new OutboxSync({
    send,
    loadStored,
    isOnline: () => online,
    now: () => new Date('2026-03-04T16:00:00.000Z'),
  });
  const save = (logId: string, body = request()) =>
    sync.save({ logId, jobId: JOB_ID, userId: USER, jobLabel: '#12 Koi pond', request: body });
  return { sync, send, loadStored, save, setOnline: (value: boolean) => (online = value) };
}

const savedAs = (logId: string, revision: number) =>
  buildLog({ id: logId, revision, entries: request().entries });

describe('the daily-log outbox', () => {
  beforeEach(() => window.localStorage.clear());

  it('keeps a log on the phone before anything is sent, and sends nothing while offline', async () => {
    const { sync, send, save, setOnline } = setup();
    setOnline(false);
    save(LOG_A);
    expect(readOutboxItem(LOG_A)).toMatchObject({ status: 'waiting', request: request() });
    await sync.syncNow(USER);
    expect(send).not.toHaveBeenCalled();
  });

  it('sends one log at a time, each once, however often a sync is asked for', async () => {
    const replies: Record<string, ReturnType<typeof deferred<DailyLogView>>> = {
      [LOG_A]: deferred<DailyLogView>(),
      [LOG_B]: deferred<DailyLogView>(),
    };
    const { sync, send, save } = setup(vi.fn((_job, logId) => replies[logId]!.promise));
    save(LOG_A);
    save(LOG_B);

    const rounds = [sync.syncNow(USER), sync.syncNow(USER), sync.syncNow(USER)];
    await vi.waitFor(() => expect(send).toHaveBeenCalledTimes(1));
    expect(sync.getSnapshot().sendingLogId).toBe(LOG_A);
    replies[LOG_A]!.resolve(savedAs(LOG_A, 1));
    await vi.waitFor(() => expect(send).toHaveBeenCalledTimes(2));
    expect(send.mock.calls[1]?.[1]).toBe(LOG_B);
    replies[LOG_B]!.resolve(savedAs(LOG_B, 1));
    await Promise.all(rounds);

    expect(send).toHaveBeenCalledTimes(2);
    expect(readOutbox()).toEqual([]);
  });

  it('stops the round at a network error and sends the same body next time', async () => {
    const send = vi
      .fn<(jobId: string, logId: string, body: SaveDailyLogRequest) => Promise<DailyLogView>>()
      .mockRejectedValueOnce(new NetworkError(new TypeError('Failed to fetch')))
      .mockResolvedValue(savedAs(LOG_A, 1));
    const { sync, save } = setup(send);
    save(LOG_A);
    save(LOG_B);

    await sync.syncNow(USER);
    expect(send).toHaveBeenCalledTimes(1);
    expect(readOutboxItem(LOG_A)).toMatchObject({
      status: 'waiting',
      attempts: 1,
      lastTrouble: 'offline',
    });

    await sync.syncNow(USER);
    expect(send.mock.calls[1]).toEqual(send.mock.calls[0]);
    expect(readOutbox()).toEqual([]);
  });

  it('leaves a log waiting when the server is in trouble (5xx)', async () => {
    const { sync, save } = setup(
      vi.fn(async () => {
        throw new ApiError({ statusCode: 503, error: 'Service Unavailable', message: 'Busy' });
      }),
    );
    save(LOG_A);
    await sync.syncNow(USER);
    expect(readOutboxItem(LOG_A)).toMatchObject({ status: 'waiting', lastTrouble: 'server' });
  });

  it('keeps a log that was saved again while on its way, based on the revision its first copy made', async () => {
    const first = deferred<DailyLogView>();
    const send = vi
      .fn<(jobId: string, logId: string, body: SaveDailyLogRequest) => Promise<DailyLogView>>()
      .mockReturnValueOnce(first.promise)
      .mockResolvedValue(savedAs(LOG_A, 2));
    const { sync, save } = setup(send);
    const key = draftKey(USER, JOB_ID, '2026-03-04');
    writeDraft(key, {
      logId: LOG_A,
      jobId: JOB_ID,
      logDate: '2026-03-04',
      baseRevision: 0,
      values: emptyLogValues(),
      dirty: true,
      updatedAt: '',
    });
    save(LOG_A, request(0, '7'));
    const round = sync.syncNow(USER);
    await vi.waitFor(() => expect(send).toHaveBeenCalledTimes(1));
    save(LOG_A, request(0, '8'));
    first.resolve(savedAs(LOG_A, 1));
    await round;

    expect(send).toHaveBeenCalledTimes(2);
    expect(send.mock.calls[1]?.[2]).toEqual(request(1, '8'));
    expect(readOutbox()).toEqual([]);
    expect(readDraft(key)?.baseRevision).toBe(2);
  });

  it('marks a conflict with the stored log and never drops it by itself', async () => {
    const stored = savedAs(LOG_A, 3);
    const { sync, save, send, loadStored } = setup(
      vi.fn(async () => {
        throw new ApiError({
          statusCode: 409,
          error: 'Conflict',
          message: 'Changed',
          code: 'LOG_CONFLICT',
        });
      }),
    );
    loadStored.mockResolvedValue(stored);
    save(LOG_A);
    await sync.syncNow(USER);
    await sync.syncNow(USER);

    expect(send).toHaveBeenCalledTimes(1);
    expect(readOutboxItem(LOG_A)).toMatchObject({ status: 'conflict', current: stored });

    sync.keepMine(LOG_A, 3);
    expect(readOutboxItem(LOG_A)).toMatchObject({ status: 'waiting', request: request(3) });
  });

  it('ties the server’s field messages to rows by id and keeps the refused log', async () => {
    const { sync, save } = setup(
      vi.fn(async () => {
        throw new ApiError({
          statusCode: 400,
          error: 'Bad Request',
          message: 'Nobody of that name is on the team',
          details: [{ field: 'entries.0.person', message: 'Nobody of that name is on the team' }],
        });
      }),
    );
    save(LOG_A);
    await sync.syncNow(USER);
    expect(readOutboxItem(LOG_A)).toMatchObject({
      status: 'rejected',
      problem: {
        fields: [
          { entryId: ENTRY, field: 'person', message: 'Nobody of that name is on the team' },
        ],
      },
    });
  });

  it('keeps everything when the session has ended, and says a sign-in is needed', async () => {
    const { sync, save, send } = setup(
      vi.fn(async () => {
        throw new ApiError({ statusCode: 401, error: 'Unauthorized', message: 'Sign in' });
      }),
    );
    save(LOG_A);
    save(LOG_B);
    await sync.syncNow(USER);
    expect(send).toHaveBeenCalledTimes(1);
    expect(readOutbox().map((item) => item.status)).toEqual(['waiting', 'waiting']);
    expect(sync.getSnapshot().signInNeeded).toBe(true);
  });

  it('sends only the logs of the person signed in', async () => {
    const { sync, send, save } = setup(vi.fn(async () => savedAs(LOG_A, 1)));
    save(LOG_A);
    await sync.syncNow('someone-else');
    expect(send).not.toHaveBeenCalled();
    expect(readOutbox()).toHaveLength(1);
  });
});
