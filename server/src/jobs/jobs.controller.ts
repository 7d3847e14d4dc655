import { Body, Controller, Get, HttpCode, Param, Post, Put, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { DailyLogView, JobCostReport, JobListItem, JobView } from '@pondwright/shared';
import type { Response } from 'express';
import { AnyRole, CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { JobLogsService } from './job-logs.service';
import { JobReportService } from './job-report.service';
import { JobsService } from './jobs.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs')
export class JobsController {
  constructor(
    private readonly jobs: JobsService,
    private readonly logs: JobLogsService,
    private readonly reports: JobReportService,
  ) {}

  @Roles('owner', 'estimator')
  @Get(':id/report')
  report(@Param('id') id: string): Promise<JobCostReport> {
    return this.reports.report(id);
  }

  @Roles('owner', 'estimator')
  @Get(':id/report.csv')
  async reportCsv(@Param('id') id: string, @Res() response: Response): Promise<void> {
    const csv = await this.reports.csv(id);
    response
      .status(200)
      .type('text/csv; charset=utf-8')
      .setHeader('Content-Disposition', `attachment; filename="${csv.filename}"`)
      .send(csv.text);
  }

  /** Body: `createJobRequestSchema`. */
  @Roles('owner', 'estimator')
  @Post()
  create(@Body() body: unknown, @CurrentUser() user: Principal): Promise<JobView> {
    return this.jobs.create(body, user.userId, user.role);
  }

  @AnyRole()
  @Get()
  list(
    @Query() query: { from?: string; to?: string; status?: string; crewId?: string },
  ): Promise<JobListItem[]> {
    return this.jobs.list(query);
  }

  @AnyRole()
  @Get(':id')
  get(@Param('id') id: string, @CurrentUser() user: Principal): Promise<JobView> {
    return this.jobs.get(id, user.role);
  }

  /** Body: `rescheduleJobRequestSchema`. */
  @Roles('owner', 'estimator')
  @Post(':id/schedule')
  @HttpCode(200)
  reschedule(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<JobView> {
    return this.jobs.reschedule(id, body, user.userId, user.role);
  }

  /** Body: `jobStatusRequestSchema`; closing is the owner's (checked with the step). */
  @AnyRole()
  @Post(':id/status')
  @HttpCode(200)
  setStatus(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<JobView> {
    return this.jobs.setStatus(id, body, user.role);
  }

  @AnyRole()
  @Get(':id/logs')
  async listLogs(@Param('id') id: string): Promise<DailyLogView[]> {
    const job = await this.jobs.findJob(id);
    return this.logs.list(job.id);
  }

  /** Body: `saveDailyLogRequestSchema`. 201 when the log is new, 200 for an edit or a resend. */
  @AnyRole()
  @Put(':id/logs/:logId')
  async saveLog(
    @Param('id') id: string,
    @Param('logId') logId: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
    @Res({ passthrough: true }) response: Response,
  ): Promise<DailyLogView> {
    const saved = await this.logs.save(id, logId, body, user.userId);
    response.status(saved.created ? 201 : 200);
    return saved.log;
  }
}
