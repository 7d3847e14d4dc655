import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { saveDailyLogRequestSchema, type DailyLogView } from '@pondwright/shared';
import { createHash } from 'node:crypto';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { isUuid } from '../common/tenancy/tenant-repository';
import { parseBody } from '../common/validation/parse-body';
import { canonicalJson } from '../estimates/content-hash';
import { JobLog } from './entities/job-log.entity';
import { Job } from './entities/job.entity';
import { LogConflictError } from './log-conflict';

export type SavedLog = { log: DailyLogView; created: boolean };

/**
 * The crew lead's daily logs. The phone makes each log's id, so sending it again after a lost answer
 * is recognised: the same content is a no-op, an edit from the stored revision is the next revision,
 * and an edit from an older revision is a conflict returned with the stored log, never a silent loss.
 */
@Injectable()
export class JobLogsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
  ) {}

  async list(
    jobId: string,
    manager: EntityManager = this.dataSource.manager,
  ): Promise<DailyLogView[]> {
    const logs = await manager.find(JobLog, {
      where: { jobId, companyId: this.tenant.companyId },
      relations: { author: true },
      order: { logDate: 'ASC', createdAt: 'ASC' },
    });
    return logs.map(logView);
  }

  async save(jobId: string, logId: string, body: unknown, authorId: string): Promise<SavedLog> {
    if (!isUuid(logId)) throw new AppError('NOT_FOUND', 'Log not found');
    const request = parseBody(saveDailyLogRequestSchema, body);
    const companyId = this.tenant.companyId;
    const content = { logDate: request.logDate, notes: request.notes, entries: request.entries };
    const sha256 = createHash('sha256').update(canonicalJson(content), 'utf8').digest('hex');
    const created = await this.dataSource.transaction(async (manager) => {
      const job = isUuid(jobId)
        ? await manager.findOne(Job, {
            where: { id: jobId, companyId },
            lock: { mode: 'pessimistic_read' },
          })
        : null;
      if (!job) throw new AppError('NOT_FOUND', 'Job not found');
      if (job.status === 'closed') {
        throw new AppError('JOB_CLOSED', 'This job is closed; its logs can no longer change.');
      }
      const stored = await manager.findOne(JobLog, {
        where: { id: logId },
        relations: { author: true },
        lock: { mode: 'pessimistic_write', tables: ['job_logs'] },
      });
      if (stored && (stored.companyId !== companyId || stored.jobId !== job.id)) {
        throw new AppError('NOT_FOUND', 'Log not found');
      }
      if (!stored) {
        await manager.insert(JobLog, {
          id: logId,
          companyId,
          jobId: job.id,
          ...content,
          contentSha256: sha256,
          revision: 1,
          authorId,
        });
        return true;
      }
      if (stored.contentSha256 === sha256) return false; // a resend of what is stored
      if (stored.revision !== request.baseRevision) throw new LogConflictError(logView(stored));
      await manager.update(
        JobLog,
        { id: logId },
        { ...content, contentSha256: sha256, revision: stored.revision + 1, authorId },
      );
      return false;
    });
    const log = await this.dataSource.manager.findOneOrFail(JobLog, {
      where: { id: logId },
      relations: { author: true },
    });
    return { log: logView(log), created };
  }
}

export function logView(log: JobLog): DailyLogView {
  return {
    id: log.id,
    jobId: log.jobId,
    logDate: log.logDate,
    notes: log.notes,
    entries: log.entries,
    revision: log.revision,
    authorName: log.author?.name ?? '',
    updatedAt: log.updatedAt.toISOString(),
  };
}
