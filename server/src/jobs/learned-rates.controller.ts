import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { LearnedRate } from '@pondwright/shared';
import type { PriceBookVersionView } from '../price-book/dto/price-book.dto';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { LearnedRatesService } from './learned-rates.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('learned-rates')
export class LearnedRatesController {
  constructor(private readonly rates: LearnedRatesService) {}

  @Roles('owner', 'estimator')
  @Get()
  list(): Promise<LearnedRate[]> {
    return this.rates.list();
  }

  /** Body: `adoptLearnedRateRequestSchema`. The owner keeps the price book. */
  @Roles('owner')
  @Post('adopt')
  adopt(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PriceBookVersionView> {
    return this.rates.adopt(body, user.userId);
  }
}
