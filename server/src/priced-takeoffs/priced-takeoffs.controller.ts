import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBearerAuth, ApiBody, ApiTags } from '@nestjs/swagger';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import {
  createPricedTakeoffBodyDoc,
  type PricedTakeoffListItem,
  type PricedTakeoffView,
  type RepricePreview,
} from './dto/priced-takeoff.dto';
import { PricedTakeoffsService } from './priced-takeoffs.service';

/** Saved, priced takeoffs: each keeps its price-book version until re-priced on purpose. */
@ApiTags('priced takeoffs')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@Controller('priced-takeoffs')
export class PricedTakeoffsController {
  constructor(private readonly pricedTakeoffs: PricedTakeoffsService) {}

  @Post()
  @ApiBody({ schema: createPricedTakeoffBodyDoc })
  @ApiJsonResponse(201, 'PricedTakeoffView', 'Computed and priced with the book in effect today')
  @ApiBadRequestResponse({ description: 'One message per field, e.g. `input.basins.0.maxDepthFt`' })
  create(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PricedTakeoffView> {
    return this.pricedTakeoffs.create(body, user.userId);
  }

  @Get()
  @ApiJsonResponse(200, 'PricedTakeoffListItem[]', 'Newest first: id, name, total, version number')
  list(): Promise<PricedTakeoffListItem[]> {
    return this.pricedTakeoffs.list();
  }

  @Get(':id')
  @ApiJsonResponse(200, 'PricedTakeoffView', 'The takeoff with its price and price-book version')
  get(@Param('id') id: string): Promise<PricedTakeoffView> {
    return this.pricedTakeoffs.get(id);
  }

  @Get(':id/reprice-preview')
  @ApiJsonResponse(
    200,
    'RepricePreview',
    'What re-pricing with the book in effect today would change',
  )
  repricePreview(@Param('id') id: string): Promise<RepricePreview> {
    return this.pricedTakeoffs.repricePreview(id);
  }

  @Post(':id/reprice')
  @ApiJsonResponse(201, 'PricedTakeoffView', 'Re-priced with the book in effect today')
  reprice(@Param('id') id: string): Promise<PricedTakeoffView> {
    return this.pricedTakeoffs.reprice(id);
  }
}
