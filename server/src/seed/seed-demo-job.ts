import type { LogEntry } from '@pondwright/shared';
import { createHash, randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { Crew } from '../crews/entities/crew.entity';
import { canonicalJson } from '../estimates/content-hash';
import type { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import type { Estimate } from '../estimates/entities/estimate.entity';
import { JobLog } from '../jobs/entities/job-log.entity';
import { Job } from '../jobs/entities/job.entity';
import { budgetFromAcceptance } from '../jobs/job-budget';
import type { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { User } from '../users/entities/user.entity';
import { DEMO_USERS } from './demo-data';

/**
 * The accepted demo quote as a job under way: a crew led by the demo crew lead, started last Monday,
 * with two days logged, so the schedule, the daily log and the cost report have something to show.
 */
export async function addDemoJob(
  manager: EntityManager,
  args: {
    estimate: Estimate;
    version: EstimateVersion;
    acceptance: QuoteAcceptance;
    estimatorId: string;
  },
): Promise<void> {
  const { estimate, version, acceptance } = args;
  const lead = await manager.findOneByOrFail(User, { email: DEMO_USERS[2]!.email });
  const crew = await manager.save(
    manager.create(Crew, {
      companyId: estimate.companyId,
      name: 'Reedbank crew',
      leadUserId: lead.id,
    }),
  );
  const budget = budgetFromAcceptance({
    versionNumber: version.versionNumber,
    contentSha256: version.contentSha256,
    computed: version.computed,
    optionIds: acceptance.optionIds,
    acceptedTotal: acceptance.total,
  });
  const monday = lastMonday();
  const job = await manager.save(
    manager.create(Job, {
      companyId: estimate.companyId,
      estimateId: estimate.id,
      acceptanceId: acceptance.id,
      status: 'in_progress',
      crewId: crew.id,
      plannedStart: monday,
      plannedCrewDays: budget.crewDays,
      budget,
      startedOn: monday,
      createdById: args.estimatorId,
    }),
  );
  const days: Array<{ date: string; notes: string; entries: LogEntry[] }> = [
    {
      date: monday,
      notes: 'Dug the basin and shelves; spoil hauled in two loads.',
      entries: [hours(lead.name, 'excavation', '8'), hours('Tobin Marsh', 'excavation', '7.5')],
    },
    {
      date: addDays(monday, 1),
      notes: 'Underlayment and liner in; started the boulders.',
      entries: [
        hours(lead.name, 'linerUnderlayment', '6'),
        hours('Tobin Marsh', 'linerUnderlayment', '6'),
        hours(lead.name, 'rockPlacing', '2'),
      ],
    },
  ];
  for (const day of days) {
    const content = { logDate: day.date, notes: day.notes, entries: day.entries };
    await manager.insert(JobLog, {
      id: randomUUID(),
      companyId: estimate.companyId,
      jobId: job.id,
      ...content,
      contentSha256: createHash('sha256').update(canonicalJson(content), 'utf8').digest('hex'),
      revision: 1,
      authorId: lead.id,
    });
  }
}

function hours(person: string, task: string, value: string): LogEntry {
  return { id: randomUUID(), kind: 'hours', person, task, hours: value } as LogEntry;
}

function lastMonday(): string {
  const day = new Date();
  day.setUTCDate(day.getUTCDate() - ((day.getUTCDay() + 6) % 7) - 7);
  return day.toISOString().slice(0, 10);
}

function addDays(date: string, days: number): string {
  const day = new Date(`${date}T00:00:00Z`);
  day.setUTCDate(day.getUTCDate() + days);
  return day.toISOString().slice(0, 10);
}
