import { Module } from '@nestjs/common';
import { PriceBookModule } from '../price-book/price-book.module';
import { ApprovalsController, EstimatesController } from './estimates.controller';
import { EstimatesService } from './estimates.service';

@Module({
  imports: [PriceBookModule],
  controllers: [EstimatesController, ApprovalsController],
  providers: [EstimatesService],
})
export class EstimatesModule {}
