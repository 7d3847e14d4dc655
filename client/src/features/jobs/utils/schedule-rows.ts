import type { CrewView, JobListItem } from '@pondwright/shared';
import { daysBetween } from './week';

export type ScheduleBar = {
  job: JobListItem;
  /** 1 (Monday) to 5 (Friday): the first column the bar covers this week. */
  column: number;
  /** Columns covered, at least 1. */
  span: number;
  /** The job began before this Monday, or goes on after this Friday. */
  continuesBefore: boolean;
  continuesAfter: boolean;
};

export type ScheduleRow = { key: string; crewName: string; crewless: boolean; bars: ScheduleBar[] };

/** Where a job's planned days fall in the week starting `monday`, or null when none are Monday to Friday. */
export function barFor(job: JobListItem, monday: string): ScheduleBar | null {
  if (!job.plannedStart) return null;
  const end = job.plannedEnd ?? job.plannedStart;
  const first = Math.max(0, daysBetween(monday, job.plannedStart));
  const last = Math.min(4, daysBetween(monday, end));
  if (first > last) return null;
  return {
    job,
    column: first + 1,
    span: last - first + 1,
    continuesBefore: daysBetween(monday, job.plannedStart) < 0,
    continuesAfter: daysBetween(monday, end) > 4,
  };
}

export const NO_CREW_KEY = 'no-crew';

/**
 * One row per crew, in the crews' order, then "No crew". A job whose crew is not in the list (the
 * list is still loading, say) gets a row of its own under the crew name the job carries.
 */
export function scheduleRows(
  crews: readonly CrewView[],
  jobs: readonly JobListItem[],
  monday: string,
): ScheduleRow[] {
  const rows = new Map<string, ScheduleRow>(
    crews.map((crew) => [
      crew.id,
      { key: crew.id, crewName: crew.name, crewless: false, bars: [] },
    ]),
  );
  const noCrew: ScheduleRow = { key: NO_CREW_KEY, crewName: 'No crew', crewless: true, bars: [] };
  for (const job of jobs) {
    const bar = barFor(job, monday);
    if (!bar) continue;
    let row = job.crewId ? rows.get(job.crewId) : noCrew;
    if (!row && job.crewId) {
      row = { key: job.crewId, crewName: job.crewName ?? 'Crew', crewless: false, bars: [] };
      rows.set(job.crewId, row);
    }
    row?.bars.push(bar);
  }
  const byStart = (a: ScheduleBar, b: ScheduleBar) => a.column - b.column || b.span - a.span;
  return [...rows.values(), noCrew].map((row) => ({ ...row, bars: row.bars.sort(byStart) }));
}
