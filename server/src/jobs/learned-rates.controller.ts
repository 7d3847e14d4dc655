import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { adoptLearnedRateRequestSchema, type LearnedRate } from '@pondwright/shared';
import type { PriceBookVersionView } from '../price-book/dto/price-book.dto';
import { ApiJsonResponse, ApiZodBody } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { LearnedRatesService } from './learned-rates.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('learned-rates')
export class LearnedRatesController {
  constructor(private readonly rates: LearnedRatesService) {}

  @Roles('owner', 'estimator')
  @Get()
  @ApiJsonResponse(200, 'LearnedRate[]', 'Production rates learned from the crews’ logged hours')
  list(): Promise<LearnedRate[]> {
    return this.rates.list();
  }

  /** The owner keeps the price book. */
  @Roles('owner')
  @Post('adopt')
  @ApiZodBody(adoptLearnedRateRequestSchema)
  @ApiJsonResponse(201, 'PriceBookVersionView', 'A new price-book version with the learned rate')
  adopt(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PriceBookVersionView> {
    return this.rates.adopt(body, user.userId);
  }
}
