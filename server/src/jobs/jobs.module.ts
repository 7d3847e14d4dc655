import { Module } from '@nestjs/common';
import { JobLogsService } from './job-logs.service';
import { JobReportService } from './job-report.service';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';

@Module({
  controllers: [JobsController],
  providers: [JobsService, JobLogsService, JobReportService],
})
export class JobsModule {}
