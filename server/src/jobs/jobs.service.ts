import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  createJobRequestSchema,
  JOB_STATUSES,
  jobStatusRequestSchema,
  rescheduleJobRequestSchema,
  type CrewBudgetLine,
  type JobListItem,
  type JobStatus,
  type JobView,
  type Role,
} from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { isUuid } from '../common/tenancy/tenant-repository';
import { parseBody } from '../common/validation/parse-body';
import { Crew } from '../crews/entities/crew.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { fieldErrors } from '../estimates/field-errors';
import { lockEstimate } from '../estimates/lock-estimate';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { recordEstimateEvent } from '../quotes/estimate-events';
import { JobScheduleChange } from './entities/job-schedule-change.entity';
import { Job } from './entities/job.entity';
import { findCompanyJob } from './find-job';
import { budgetFromAcceptance } from './job-budget';
import { JobLogsService } from './job-logs.service';
import { plannedEnd } from './working-days';
import { lookUpTogether } from '../database/look-up-together';

/** Which status may follow which, and who may make the move. */
const NEXT_STATUS: Record<JobStatus, { next: JobStatus; roles: Role[] } | null> = {
  scheduled: { next: 'in_progress', roles: ['owner', 'estimator', 'crew_lead'] },
  in_progress: { next: 'completed', roles: ['owner', 'estimator', 'crew_lead'] },
  completed: { next: 'closed', roles: ['owner'] },
  closed: null,
};

type JobRow = {
  id: string;
  number: number;
  title: string;
  customer_name: string;
  address_line: string | null;
  city: string | null;
  status: JobStatus;
  crew_id: string | null;
  crew_name: string | null;
  planned_start: string | null;
  planned_crew_days: string;
};

@Injectable()
export class JobsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly logs: JobLogsService,
  ) {}

  /**
   * Makes the job of an accepted estimate: its budget is the accepted version's lines with the chosen
   * options, fixed now; its planned crew days come from the takeoff.
   */
  async create(body: unknown, actorId: string, role: Role): Promise<JobView> {
    const request = parseBody(createJobRequestSchema, body);
    const companyId = this.tenant.companyId;
    const id = await this.dataSource.transaction(async (manager) => {
      const estimate = await lockEstimate(manager, request.estimateId, companyId);
      const acceptance = await manager.findOneBy(QuoteAcceptance, { estimateId: estimate.id });
      if (estimate.status !== 'accepted' || !acceptance) {
        throw new AppError(
          'ESTIMATE_NOT_ACCEPTED',
          'Only an accepted quote becomes a job. Send it and wait for the homeowner to accept.',
        );
      }
      if (await manager.existsBy(Job, { estimateId: estimate.id })) {
        throw new AppError('JOB_EXISTS', 'This estimate already has its job.');
      }
      const crewId = await this.checkCrew(manager, request.crewId ?? null);
      const version = await manager.findOneByOrFail(EstimateVersion, { id: acceptance.versionId });
      const budget = budgetFromAcceptance({
        versionNumber: version.versionNumber,
        contentSha256: version.contentSha256,
        computed: version.computed,
        optionIds: acceptance.optionIds,
        acceptedTotal: acceptance.total,
      });
      const job = await manager.save(
        manager.create(Job, {
          companyId,
          estimateId: estimate.id,
          acceptanceId: acceptance.id,
          status: 'scheduled',
          crewId,
          plannedStart: request.plannedStart ?? null,
          plannedCrewDays: budget.crewDays,
          budget,
          createdById: actorId,
        }),
      );
      if (request.plannedStart) {
        await manager.insert(JobScheduleChange, {
          companyId,
          jobId: job.id,
          fromStart: null,
          toStart: request.plannedStart,
          fromCrewId: null,
          toCrewId: crewId,
          reason: null,
          note: null,
          actorId,
        });
      }
      await recordEstimateEvent(manager, {
        companyId,
        estimateId: estimate.id,
        actorId,
        action: 'job-created',
        detail: { jobId: job.id, plannedStart: request.plannedStart ?? null },
      });
      return job.id;
    });
    return this.get(id, role);
  }

  /**
   * Jobs whose planned days overlap `from`–`to`, or every job when no range is given; newest start
   * last, unscheduled ones first.
   */
  async list(query: {
    from?: string;
    to?: string;
    status?: string;
    crewId?: string;
  }): Promise<JobListItem[]> {
    const problems: Array<{ field: string; message: string }> = [];
    const date = (field: 'from' | 'to') => {
      const value = query[field];
      if (!value) return null;
      if (!/^\d{4}-\d{2}-\d{2}$/.test(value) || Number.isNaN(Date.parse(value))) {
        problems.push({ field, message: 'Give a date as YYYY-MM-DD' });
      }
      return value;
    };
    const from = date('from');
    const to = date('to');
    // One status or several, comma-separated (a crew lead wants scheduled and in progress together).
    const statuses = query.status ? query.status.split(',').map((value) => value.trim()) : null;
    if (statuses?.some((value) => !(JOB_STATUSES as readonly string[]).includes(value))) {
      problems.push({ field: 'status', message: `Choose from: ${JOB_STATUSES.join(', ')}` });
    }
    const crewId = query.crewId || null;
    if (crewId && !isUuid(crewId)) problems.push({ field: 'crewId', message: 'Choose a crew' });
    if (problems.length > 0) throw fieldErrors(problems);

    const rows = (await this.dataSource.query(
      `${JOB_SELECT}
       WHERE j.company_id = $1
         AND ($2::text[] IS NULL OR j.status = ANY($2::text[]))
         AND ($3::uuid IS NULL OR j.crew_id = $3)
         AND ($4::date IS NULL OR j.planned_start IS NULL OR
              j.planned_start + (ceil(j.planned_crew_days) * 7 / 5 + 3)::int >= $4::date)
         AND ($5::date IS NULL OR j.planned_start IS NULL OR j.planned_start <= $5::date)
       ORDER BY j.planned_start NULLS FIRST, e.number`,
      [this.tenant.companyId, statuses, crewId, from, to],
    )) as JobRow[];
    // The SQL bound is generous (weekends); the exact working-day end is checked here.
    return rows
      .map(listItem)
      .filter((job) => !from || !job.plannedEnd || job.plannedEnd >= from)
      .filter((job) => !to || !job.plannedStart || job.plannedStart <= to);
  }

  async get(id: string, role: Role): Promise<JobView> {
    const manager = this.dataSource.manager;
    const job = await this.findJob(id, manager);
    const [[row], changes, logs] = await lookUpTogether(manager, [
      () => manager.query(`${JOB_SELECT} WHERE j.id = $1`, [job.id]) as Promise<JobRow[]>,
      () =>
        manager.find(JobScheduleChange, {
          where: { jobId: job.id },
          relations: { fromCrew: true, toCrew: true, actor: true },
          order: { createdAt: 'ASC' },
        }),
      () => this.logs.list(job.id),
    ]);
    const seesMoney = role !== 'crew_lead';
    return {
      ...listItem(row!),
      estimateId: job.estimateId,
      budget: seesMoney ? job.budget : null,
      // What to build with: 'other' lines (mobilization, the contingency, which names the direct
      // cost) are money, not work, and stay with the office.
      crewBudget: job.budget.lines
        .filter((line) => line.category !== 'other')
        .map((line): CrewBudgetLine => ({
          id: line.id,
          category: line.category,
          description: line.description,
          code: line.code,
          task: line.task,
          quantity: line.quantity,
          unit: line.unit,
        })),
      scheduleChanges: changes.map((change) => ({
        id: change.id,
        fromStart: change.fromStart,
        toStart: change.toStart,
        fromCrewName: change.fromCrew?.name ?? null,
        toCrewName: change.toCrew?.name ?? null,
        reason: change.reason,
        note: change.note,
        actorName: change.actor?.name ?? '',
        createdAt: change.createdAt.toISOString(),
      })),
      logs,
      startedOn: job.startedOn,
      completedOn: job.completedOn,
      closedAt: job.closedAt?.toISOString() ?? null,
    };
  }

  /** Moves the job; once it had a start, the move needs a reason. Every move is kept. */
  async reschedule(id: string, body: unknown, actorId: string, role: Role): Promise<JobView> {
    const request = parseBody(rescheduleJobRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const job = await this.lockJob(manager, id);
      if (job.status === 'closed') throw new AppError('JOB_CLOSED', 'This job is closed.');
      if (job.plannedStart && !request.reason) {
        throw fieldErrors([{ field: 'reason', message: 'Say why the job moves' }]);
      }
      const crewId = await this.checkCrew(manager, request.crewId);
      await manager.insert(JobScheduleChange, {
        companyId: job.companyId,
        jobId: job.id,
        fromStart: job.plannedStart,
        toStart: request.plannedStart,
        fromCrewId: job.crewId,
        toCrewId: crewId,
        reason: request.reason ?? null,
        note: request.note || null,
        actorId,
      });
      await manager.update(
        Job,
        { id: job.id },
        {
          plannedStart: request.plannedStart,
          crewId,
          ...(request.plannedCrewDays ? { plannedCrewDays: request.plannedCrewDays } : {}),
        },
      );
    });
    return this.get(id, role);
  }

  /** Scheduled → in progress → completed → closed, one step at a time; closing is the owner's. */
  async setStatus(id: string, body: unknown, role: Role): Promise<JobView> {
    const { status } = parseBody(jobStatusRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const job = await this.lockJob(manager, id);
      const step = NEXT_STATUS[job.status];
      if (!step || step.next !== status) {
        throw new AppError(
          'JOB_STATUS_CHANGE',
          `A job that is ${job.status.replace('_', ' ')} cannot become ${status.replace('_', ' ')}.`,
        );
      }
      if (!step.roles.includes(role)) {
        throw new AppError('FORBIDDEN', 'Only the owner closes a job.');
      }
      const today = new Date().toISOString().slice(0, 10);
      await manager.update(
        Job,
        { id: job.id },
        {
          status,
          ...(status === 'in_progress' && !job.startedOn ? { startedOn: today } : {}),
          ...(status === 'completed' ? { completedOn: today } : {}),
          ...(status === 'closed' ? { closedAt: new Date() } : {}),
        },
      );
    });
    return this.get(id, role);
  }

  /** The job's number: its estimate's. */
  async numberOf(job: Job, manager: EntityManager = this.dataSource.manager): Promise<number> {
    const [row] = (await manager.query('SELECT number FROM estimates WHERE id = $1', [
      job.estimateId,
    ])) as Array<{ number: number }>;
    return row!.number;
  }

  /** The company's job, or a 404. */
  findJob(id: string, manager: EntityManager = this.dataSource.manager): Promise<Job> {
    return findCompanyJob(manager, id, this.tenant.companyId);
  }

  private lockJob(manager: EntityManager, id: string): Promise<Job> {
    return findCompanyJob(manager, id, this.tenant.companyId, true);
  }

  private async checkCrew(manager: EntityManager, crewId: string | null): Promise<string | null> {
    if (!crewId) return null;
    const crew = await manager.findOneBy(Crew, { id: crewId, companyId: this.tenant.companyId });
    if (!crew) throw fieldErrors([{ field: 'crewId', message: 'Choose one of your crews' }]);
    return crew.id;
  }
}

const JOB_SELECT = `
  SELECT j.id, e.number, e.title, c.name AS customer_name, s.address_line, s.city, j.status,
         j.crew_id, cr.name AS crew_name, to_char(j.planned_start, 'YYYY-MM-DD') AS planned_start,
         j.planned_crew_days
  FROM jobs j
  JOIN estimates e ON e.id = j.estimate_id
  JOIN customers c ON c.id = e.customer_id
  LEFT JOIN sites s ON s.id = e.site_id
  LEFT JOIN crews cr ON cr.id = j.crew_id`;

function listItem(row: JobRow): JobListItem {
  return {
    id: row.id,
    number: row.number,
    title: row.title,
    customerName: row.customer_name,
    siteAddress: row.address_line ? [row.address_line, row.city].filter(Boolean).join(', ') : null,
    status: row.status,
    crewId: row.crew_id,
    crewName: row.crew_name,
    plannedStart: row.planned_start,
    plannedCrewDays: row.planned_crew_days,
    plannedEnd: row.planned_start
      ? plannedEnd(row.planned_start, Number(row.planned_crew_days))
      : null,
  };
}
