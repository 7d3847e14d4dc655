import { Injectable } from '@nestjs/common';
import { jobCostReport, jobReportCsv, type JobCostReport } from '@pondwright/shared';
import type { Job } from './entities/job.entity';
import { JobLogsService } from './job-logs.service';
import { JobsService } from './jobs.service';

/** Estimate against actual for one job, from its budget and every daily log (see `jobCostReport`). */
@Injectable()
export class JobReportService {
  constructor(
    private readonly jobs: JobsService,
    private readonly logs: JobLogsService,
  ) {}

  async report(jobId: string): Promise<JobCostReport> {
    return this.reportFor(await this.jobs.findJob(jobId));
  }

  async csv(jobId: string): Promise<{ filename: string; text: string }> {
    const job = await this.jobs.findJob(jobId);
    const [report, number] = await Promise.all([this.reportFor(job), this.jobs.numberOf(job)]);
    return {
      filename: `job-${number}-cost-report.csv`,
      text: jobReportCsv(report, { currency: report.currency }),
    };
  }

  private async reportFor(job: Job): Promise<JobCostReport> {
    const logs = await this.logs.list(job.id);
    return jobCostReport({
      budget: job.budget,
      logs,
      plannedStart: job.plannedStart,
      plannedCrewDays: job.plannedCrewDays,
    });
  }
}
