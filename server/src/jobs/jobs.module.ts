import { Module } from '@nestjs/common';
import { JobLogsService } from './job-logs.service';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';

@Module({
  controllers: [JobsController],
  providers: [JobsService, JobLogsService],
})
export class JobsModule {}
