import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { Roles } from '../common/decorators/auth.decorators';
import { EstimatesStatsService, type EstimateStats } from './estimates-stats.service';

/** The owner's dashboard figures; a path of its own so it never meets `GET /api/estimates/:id`. */
@ApiTags('estimates')
@ApiBearerAuth()
@Roles('owner')
@Controller('estimate-stats')
export class EstimatesStatsController {
  constructor(private readonly stats: EstimatesStatsService) {}

  @Get()
  @ApiJsonResponse(
    200,
    'EstimateStats',
    'Count and value by status, win rate and average margin, for the caller’s company',
  )
  get(): Promise<EstimateStats> {
    return this.stats.stats();
  }
}
