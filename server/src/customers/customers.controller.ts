import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiNotFoundResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { CustomerDetail, CustomerPage, SiteView } from '@pondwright/shared';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { AnyRole, Roles } from '../common/decorators/auth.decorators';
import {
  CreateCustomerDto,
  CreateSiteDto,
  CustomerListQueryDto,
  UpdateCustomerDto,
  UpdateSiteDto,
} from './dto/customer.dto';
import { CustomersService } from './customers.service';

/**
 * Customers and their sites. Owners and estimators read and write; crew leads read, since the job packet
 * carries the site's access notes.
 */
@ApiTags('customers')
@ApiBearerAuth()
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @AnyRole()
  @Get()
  @ApiJsonResponse(200, 'CustomerPage', 'One page of customers, searched and sorted on the server')
  list(@Query() query: CustomerListQueryDto): Promise<CustomerPage> {
    return this.customers.list(query);
  }

  @Roles('owner', 'estimator')
  @Post()
  @ApiJsonResponse(201, 'CustomerDetail', 'The customer with any sites sent along')
  @ApiBadRequestResponse({ description: 'One message per field' })
  create(@Body() body: CreateCustomerDto): Promise<CustomerDetail> {
    return this.customers.create(body);
  }

  @AnyRole()
  @Get(':id')
  @ApiJsonResponse(200, 'CustomerDetail', 'The customer with every site')
  @ApiNotFoundResponse()
  get(@Param('id') id: string): Promise<CustomerDetail> {
    return this.customers.get(id);
  }

  @Roles('owner', 'estimator')
  @Patch(':id')
  @ApiJsonResponse(200, 'CustomerDetail', 'The customer as saved, with every site')
  update(@Param('id') id: string, @Body() body: UpdateCustomerDto): Promise<CustomerDetail> {
    return this.customers.update(id, body);
  }

  @Roles('owner', 'estimator')
  @Delete(':id')
  @HttpCode(204)
  async remove(@Param('id') id: string): Promise<void> {
    await this.customers.remove(id);
  }

  @Roles('owner', 'estimator')
  @Post(':id/sites')
  @ApiJsonResponse(201, 'SiteView', 'The new site')
  addSite(@Param('id') id: string, @Body() body: CreateSiteDto): Promise<SiteView> {
    return this.customers.addSite(id, body);
  }

  @Roles('owner', 'estimator')
  @Patch(':id/sites/:siteId')
  @ApiJsonResponse(200, 'SiteView', 'The site as saved')
  updateSite(
    @Param('id') id: string,
    @Param('siteId') siteId: string,
    @Body() body: UpdateSiteDto,
  ): Promise<SiteView> {
    return this.customers.updateSite(id, siteId, body);
  }

  @Roles('owner', 'estimator')
  @Delete(':id/sites/:siteId')
  @HttpCode(204)
  async removeSite(@Param('id') id: string, @Param('siteId') siteId: string): Promise<void> {
    await this.customers.removeSite(id, siteId);
  }
}
