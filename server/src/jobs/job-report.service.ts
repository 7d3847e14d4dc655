import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { jobCostReport, jobReportCsv, type JobCostReport } from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { readOnReplica } from '../database/read-replica';
import type { Job } from './entities/job.entity';
import { JobLogsService } from './job-logs.service';
import { JobsService } from './jobs.service';

/**
 * Estimate against actual for one job, from its budget and every daily log (see `jobCostReport`).
 * Read on the replica when there is one: a job created or a log saved a moment ago may show a moment
 * later.
 */
@Injectable()
export class JobReportService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
    private readonly logs: JobLogsService,
  ) {}

  report(jobId: string): Promise<JobCostReport> {
    return readOnReplica(this.dataSource, async (manager) =>
      this.reportFor(await this.jobs.findJob(jobId, manager), manager),
    );
  }

  csv(jobId: string): Promise<{ filename: string; text: string }> {
    return readOnReplica(this.dataSource, async (manager) => {
      const job = await this.jobs.findJob(jobId, manager);
      // One after the other: both read through the one connection of `manager`.
      const report = await this.reportFor(job, manager);
      const number = await this.jobs.numberOf(job, manager);
      return {
        filename: `job-${number}-cost-report.csv`,
        text: jobReportCsv(report, { currency: report.currency }),
      };
    });
  }

  private async reportFor(job: Job, manager: EntityManager): Promise<JobCostReport> {
    const logs = await this.logs.list(job.id, manager);
    return jobCostReport({
      budget: job.budget,
      logs,
      plannedStart: job.plannedStart,
      plannedCrewDays: job.plannedCrewDays,
    });
  }
}
