import { beforeEach, describe, expect, it } from 'vitest';
import { emptyLogValues } from '../utils/log-values';
import { storageKey, writeJson } from './device-storage';
import { draftKey, writeDraft, type LogDraft } from './draft-store';
import { writeOutboxItem, type OutboxItem } from './outbox-store';
import { pruneDeviceStorage } from './prune';

const NOW = new Date('2026-03-30T12:00:00.000Z');
const OLD = '2026-02-01T12:00:00.000Z';

const draft = (logId: string, dirty: boolean): LogDraft => ({
  logId,
  jobId: 'job',
  logDate: logId,
  baseRevision: 1,
  values: emptyLogValues(),
  dirty,
  updatedAt: OLD,
});

describe('pruning the phone’s storage', () => {
  beforeEach(() => window.localStorage.clear());

  it('drops old sent drafts and old copies, never typing or anything still waiting', () => {
    writeDraft(draftKey('u', 'job', 'sent'), draft('sent', false));
    writeDraft(draftKey('u', 'job', 'typing'), draft('typing', true));
    writeDraft(draftKey('u', 'job', 'queued'), draft('queued', false));
    writeOutboxItem({ logId: 'queued', status: 'waiting' } as OutboxItem);
    writeJson(storageKey('copy', 'u', 'job.old'), { data: {}, copiedAt: OLD });
    writeJson(storageKey('copy', 'u', 'job.new'), {
      data: {},
      copiedAt: '2026-03-29T12:00:00.000Z',
    });

    pruneDeviceStorage(NOW);

    expect(Object.keys(window.localStorage).sort()).toEqual(
      [
        draftKey('u', 'job', 'queued'),
        draftKey('u', 'job', 'typing'),
        storageKey('copy', 'u', 'job.new'),
        storageKey('outbox', 'queued'),
      ].sort(),
    );
  });
});
