import { Module } from '@nestjs/common';
import { PriceBookModule } from '../price-book/price-book.module';
import { ApprovalsController, EstimatesController } from './estimates.controller';
import { EstimatesStatsController } from './estimates-stats.controller';
import { EstimatesStatsService } from './estimates-stats.service';
import { EstimatesService } from './estimates.service';

@Module({
  imports: [PriceBookModule],
  controllers: [EstimatesController, ApprovalsController, EstimatesStatsController],
  providers: [EstimatesService, EstimatesStatsService],
})
export class EstimatesModule {}
