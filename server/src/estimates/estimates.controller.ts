import { Body, Controller, Get, Param, Post, Put, Query, UseFilters } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConflictResponse,
  ApiTags,
} from '@nestjs/swagger';
import type {
  ApprovalQueueItem,
  EstimateComparison,
  EstimateEventView,
  EstimateListPage,
  EstimateVersionView,
  EstimateView,
} from '@pondwright/shared';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import {
  createEstimateBodyDoc,
  finaliseEstimateBodyDoc,
  saveDraftBodyDoc,
  sendBackEstimateBodyDoc,
} from './dto/estimate.dto';
import { EstimatesService, type EstimateListQuery } from './estimates.service';
import { StaleDraftFilter } from './stale-draft';

/** Estimates with their draft, versions and audit log. Crew leads see no prices, so no estimates. */
@ApiTags('estimates')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@UseFilters(StaleDraftFilter)
@Controller('estimates')
export class EstimatesController {
  constructor(private readonly estimates: EstimatesService) {}

  @Post()
  @ApiBody({ schema: createEstimateBodyDoc })
  @ApiJsonResponse(201, 'EstimateView', 'Numbered, with a first draft priced by the server')
  create(@Body() body: unknown, @CurrentUser() user: Principal): Promise<EstimateView> {
    return this.estimates.create(body, user.userId);
  }

  @Get()
  @ApiJsonResponse(
    200,
    'EstimateListPage',
    'Newest change first; filter by status, search title, customer, number',
  )
  list(@Query() query: EstimateListQuery): Promise<EstimateListPage> {
    return this.estimates.list(query);
  }

  @Get(':id')
  @ApiJsonResponse(200, 'EstimateView', 'The estimate with its working draft and versions')
  get(@Param('id') id: string): Promise<EstimateView> {
    return this.estimates.get(id);
  }

  @Get(':id/events')
  @ApiJsonResponse(200, 'EstimateEventView[]', 'The whole audit log, oldest first')
  events(@Param('id') id: string): Promise<EstimateEventView[]> {
    return this.estimates.events(id);
  }

  @Put(':id/draft')
  @ApiBody({ schema: saveDraftBodyDoc })
  @ApiJsonResponse(200, 'EstimateView', 'Recomputed and stored with the next revision')
  @ApiBadRequestResponse({ description: 'One message per field, e.g. `input.basins.0.maxDepthFt`' })
  @ApiConflictResponse({ description: 'STALE_DRAFT: the current draft is in `current`' })
  saveDraft(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<EstimateView> {
    return this.estimates.saveDraft(id, body, user.userId);
  }

  @Post(':id/finalise')
  @ApiBody({ schema: finaliseEstimateBodyDoc })
  @ApiJsonResponse(201, 'EstimateView', 'A new immutable version; awaiting approval or approved')
  @ApiConflictResponse({ description: 'STALE_DRAFT, or ESTIMATE_NOT_FINALISABLE' })
  finalise(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<EstimateView> {
    return this.estimates.finalise(id, body, user.userId);
  }

  @Get(':id/versions/:versionNumber')
  @ApiJsonResponse(200, 'EstimateVersionView', 'One frozen version with its content hash')
  getVersion(
    @Param('id') id: string,
    @Param('versionNumber') versionNumber: string,
  ): Promise<EstimateVersionView> {
    return this.estimates.getVersion(id, versionNumber);
  }

  @Get(':id/compare')
  @ApiJsonResponse(
    200,
    'EstimateComparison',
    'Lines and totals that differ from version a to version b',
  )
  compare(
    @Param('id') id: string,
    @Query('a') a: string | undefined,
    @Query('b') b: string | undefined,
  ): Promise<EstimateComparison> {
    return this.estimates.compare(id, a, b);
  }

  @Post(':id/approve')
  @Roles('owner')
  @ApiJsonResponse(201, 'EstimateView', 'Approved: ready to send')
  approve(@Param('id') id: string, @CurrentUser() user: Principal): Promise<EstimateView> {
    return this.estimates.approve(id, user.userId);
  }

  @Post(':id/send-back')
  @Roles('owner')
  @ApiBody({ schema: sendBackEstimateBodyDoc })
  @ApiJsonResponse(201, 'EstimateView', 'Back to a draft, with the owner’s reason in the log')
  sendBack(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<EstimateView> {
    return this.estimates.sendBack(id, body, user.userId);
  }
}

/** The owner's queue of estimates waiting for approval. */
@ApiTags('estimates')
@ApiBearerAuth()
@Roles('owner')
@Controller('approvals')
export class ApprovalsController {
  constructor(private readonly estimates: EstimatesService) {}

  @Get()
  @ApiJsonResponse(
    200,
    'ApprovalQueueItem[]',
    'Oldest first, each with the reasons it needs approval',
  )
  queue(): Promise<ApprovalQueueItem[]> {
    return this.estimates.approvalQueue();
  }
}
