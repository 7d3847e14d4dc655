import { Body, Controller, Get, HttpCode, Param, Post, Put, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createJobRequestSchema,
  jobStatusRequestSchema,
  rescheduleJobRequestSchema,
  saveDailyLogRequestSchema,
  type DailyLogView,
  type JobCostReport,
  type JobListItem,
  type JobView,
} from '@pondwright/shared';
import type { Response } from 'express';
import {
  ApiFileResponse,
  ApiJsonResponse,
  ApiZodBody,
} from '../common/decorators/api-docs.decorators';
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
  @ApiJsonResponse(200, 'JobCostReport', 'Budget against actual hours, materials and costs')
  report(@Param('id') id: string): Promise<JobCostReport> {
    return this.reports.report(id);
  }

  @Roles('owner', 'estimator')
  @Get(':id/report.csv')
  @ApiFileResponse('text/csv', 'The cost report as CSV, for a spreadsheet')
  async reportCsv(@Param('id') id: string, @Res() response: Response): Promise<void> {
    const csv = await this.reports.csv(id);
    response
      .status(200)
      .type('text/csv; charset=utf-8')
      .setHeader('Content-Disposition', `attachment; filename="${csv.filename}"`)
      .send(csv.text);
  }

  @Roles('owner', 'estimator')
  @Post()
  @ApiZodBody(createJobRequestSchema)
  @ApiJsonResponse(201, 'JobView', 'The job, its budget fixed from the accepted lines')
  create(@Body() body: unknown, @CurrentUser() user: Principal): Promise<JobView> {
    return this.jobs.create(body, user.userId, user.role);
  }

  @AnyRole()
  @Get()
  @ApiJsonResponse(200, 'JobListItem[]', 'Jobs in the date range, by status or crew')
  list(
    @Query() query: { from?: string; to?: string; status?: string; crewId?: string },
  ): Promise<JobListItem[]> {
    return this.jobs.list(query);
  }

  @AnyRole()
  @Get(':id')
  @ApiJsonResponse(200, 'JobView', 'The job; crew leads see no prices')
  get(@Param('id') id: string, @CurrentUser() user: Principal): Promise<JobView> {
    return this.jobs.get(id, user.role);
  }

  @Roles('owner', 'estimator')
  @Post(':id/schedule')
  @HttpCode(200)
  @ApiZodBody(rescheduleJobRequestSchema)
  @ApiJsonResponse(200, 'JobView', 'Rescheduled; the change is kept in the job’s history')
  reschedule(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<JobView> {
    return this.jobs.reschedule(id, body, user.userId, user.role);
  }

  /** Closing is the owner's (checked with the step). */
  @AnyRole()
  @Post(':id/status')
  @HttpCode(200)
  @ApiZodBody(jobStatusRequestSchema)
  @ApiJsonResponse(200, 'JobView', 'The job in its new status')
  setStatus(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<JobView> {
    return this.jobs.setStatus(id, body, user.role);
  }

  @AnyRole()
  @Get(':id/logs')
  @ApiJsonResponse(200, 'DailyLogView[]', 'The crew’s daily logs, by day')
  async listLogs(@Param('id') id: string): Promise<DailyLogView[]> {
    const job = await this.jobs.findJob(id);
    return this.logs.list(job.id);
  }

  /** 201 when the log is new, 200 for an edit or a resend (the phone makes the id, so it is idempotent). */
  @AnyRole()
  @Put(':id/logs/:logId')
  @ApiZodBody(saveDailyLogRequestSchema)
  @ApiJsonResponse(200, 'DailyLogView', 'The log as saved: an edit, or the same log sent again')
  @ApiJsonResponse(201, 'DailyLogView', 'The new log')
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
