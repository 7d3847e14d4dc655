import { Module } from '@nestjs/common';
import { PriceBookModule } from '../price-book/price-book.module';
import { JobLogsService } from './job-logs.service';
import { JobReportService } from './job-report.service';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';
import { LearnedRatesController } from './learned-rates.controller';
import { LearnedRatesService } from './learned-rates.service';

@Module({
  imports: [PriceBookModule],
  controllers: [JobsController, LearnedRatesController],
  providers: [JobsService, JobLogsService, JobReportService, LearnedRatesService],
})
export class JobsModule {}
