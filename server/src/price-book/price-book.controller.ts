import { Body, Controller, Get, HttpCode, Param, Post, Put, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiNotFoundResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { PriceBookChange } from '@pondwright/shared/pricing';
import type { Response } from 'express';
import { ApiFileResponse, ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { AnyRole, CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import {
  importPriceBookBodyDoc,
  savePolicyBodyDoc,
  savePriceBookBodyDoc,
  type MaterialsView,
  type PriceBookVersionListItem,
  type PriceBookVersionView,
  type PricingPolicyView,
} from './dto/price-book.dto';
import { PriceBookService } from './price-book.service';

/**
 * The price book. Owners write (every write is a new version), estimators read, and crew leads reach only
 * the materials list, without costs. Write bodies are validated by the shared zod schemas in the service.
 */
@ApiTags('price book')
@ApiBearerAuth()
@Controller('price-book')
export class PriceBookController {
  constructor(private readonly priceBook: PriceBookService) {}

  @Roles('owner', 'estimator')
  @Get()
  @ApiJsonResponse(200, 'PriceBookVersionView', 'The version in effect today, with the whole book')
  @ApiNotFoundResponse({ description: 'The company has no price book in effect yet' })
  current(): Promise<PriceBookVersionView> {
    return this.priceBook.current();
  }

  @Roles('owner')
  @Put()
  @HttpCode(201)
  @ApiBody({ schema: savePriceBookBodyDoc })
  @ApiJsonResponse(201, 'PriceBookVersionView', 'The new version')
  @ApiBadRequestResponse({ description: 'One message per field, e.g. `book.materials.3.unitCost`' })
  save(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PriceBookVersionView> {
    return this.priceBook.save(body, user.userId);
  }

  @Roles('owner', 'estimator')
  @Get('versions')
  @ApiJsonResponse(
    200,
    'PriceBookVersionListItem[]',
    'Every version, newest first, without the book',
  )
  listVersions(): Promise<PriceBookVersionListItem[]> {
    return this.priceBook.listVersions();
  }

  @Roles('owner', 'estimator')
  @Get('versions/:id')
  @ApiJsonResponse(200, 'PriceBookVersionView', 'One version with its book')
  getVersion(@Param('id') id: string): Promise<PriceBookVersionView> {
    return this.priceBook.getVersion(id);
  }

  @Roles('owner', 'estimator')
  @Get('versions/:id/changes')
  @ApiJsonResponse(200, 'PriceBookChange[]', 'What this version changed against the one before it')
  versionChanges(@Param('id') id: string): Promise<PriceBookChange[]> {
    return this.priceBook.versionChanges(id);
  }

  @Roles('owner', 'estimator')
  @Get('policy')
  @ApiJsonResponse(
    200,
    'PricingPolicyView',
    'The pricing policy in effect, with each markup as a margin',
  )
  policy(): Promise<PricingPolicyView> {
    return this.priceBook.policy();
  }

  @Roles('owner')
  @Put('policy')
  @HttpCode(201)
  @ApiBody({ schema: savePolicyBodyDoc })
  @ApiJsonResponse(201, 'PriceBookVersionView', 'The new version, with only the policy changed')
  savePolicy(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PriceBookVersionView> {
    return this.priceBook.savePolicy(body, user.userId);
  }

  @Roles('owner', 'estimator')
  @Get('export.csv')
  @ApiFileResponse('text/csv', 'The book in effect today as CSV, for a spreadsheet')
  async exportCsv(@Res({ passthrough: true }) response: Response): Promise<string> {
    const { filename, csv } = await this.priceBook.exportCsv();
    // Set only once the CSV exists, so an error still leaves as JSON.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @Roles('owner')
  @Post('import')
  @ApiBody({ schema: importPriceBookBodyDoc })
  @ApiJsonResponse(201, 'PriceBookVersionView', 'The new version, read from the CSV')
  @ApiBadRequestResponse({
    description:
      'Nothing imported; one detail per problem with `line`, `column` and `field` ("line 7, column unitCost")',
  })
  importCsv(@Body() body: unknown, @CurrentUser() user: Principal): Promise<PriceBookVersionView> {
    return this.priceBook.importCsv(body, user.userId);
  }

  @AnyRole()
  @Get('materials')
  @ApiJsonResponse(
    200,
    'MaterialsView',
    'The materials in effect; without unit costs for crew leads',
  )
  materials(@CurrentUser() user: Principal): Promise<MaterialsView> {
    return this.priceBook.materials(user.role);
  }
}
