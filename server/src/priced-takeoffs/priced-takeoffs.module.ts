import { Module } from '@nestjs/common';
import { PriceBookModule } from '../price-book/price-book.module';
import { PricedTakeoffsController } from './priced-takeoffs.controller';
import { PricedTakeoffsService } from './priced-takeoffs.service';

@Module({
  imports: [PriceBookModule],
  controllers: [PricedTakeoffsController],
  providers: [PricedTakeoffsService],
})
export class PricedTakeoffsModule {}
