import type { JobView } from '@pondwright/shared';
import { readDraft, type LogDraft } from '../storage/draft-store';
import { readOutbox } from '../storage/outbox-store';
import { emptyLogValues, logToValues } from './log-values';
import { newId } from './new-id';

type Source = {
  draftKey: string;
  userId: string;
  jobId: string;
  logDate: string;
  job: JobView | null;
};

/**
 * Which copy of the day's log the form opens with: unsaved typing first, then a save still waiting on
 * this phone, then the server's log for the day, then an older copy kept here; else a new log, whose
 * id is made now and kept with it from then on.
 */
export function initialDraft({ draftKey, userId, jobId, logDate, job }: Source): LogDraft {
  const lines = job?.crewBudget ?? [];
  const draft = readDraft(draftKey);
  if (draft?.dirty) return draft;
  const base = { jobId, logDate, dirty: false, updatedAt: new Date().toISOString() };

  const queued = readOutbox().find(
    (item) => item.userId === userId && item.jobId === jobId && item.request.logDate === logDate,
  );
  if (queued) {
    return {
      ...base,
      logId: queued.logId,
      baseRevision: queued.request.baseRevision,
      values: logToValues(queued.request, lines),
    };
  }
  const stored = job?.logs.find((log) => log.logDate === logDate);
  if (stored) {
    return {
      ...base,
      logId: stored.id,
      baseRevision: stored.revision,
      values: logToValues(stored, lines),
    };
  }
  return draft ?? { ...base, logId: newId(), baseRevision: 0, values: emptyLogValues() };
}

/** Names already on the job's logs, offered as the person is typed. */
export function peopleOn(job: JobView | null): string[] {
  const names = new Set<string>();
  for (const log of job?.logs ?? []) {
    for (const entry of log.entries) if (entry.kind === 'hours') names.add(entry.person);
  }
  return [...names].sort((a, b) => a.localeCompare(b));
}
