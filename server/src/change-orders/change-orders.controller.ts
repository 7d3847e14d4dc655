import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createChangeOrderRequestSchema,
  sendInvoiceRequestSchema,
  type ChangeOrderView,
} from '@pondwright/shared';
import { ApiJsonResponse, ApiZodBody } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { ChangeOrdersService } from './change-orders.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs/:id/change-orders')
export class ChangeOrdersController {
  constructor(private readonly orders: ChangeOrdersService) {}

  /** Staff only: a change order is prices; the crew sees accepted changes in the job's crew budget. */
  @Roles('owner', 'estimator')
  @Get()
  @ApiJsonResponse(200, 'ChangeOrderView[]', 'The job’s change orders, oldest first')
  list(@Param('id') id: string): Promise<ChangeOrderView[]> {
    return this.orders.list(id);
  }

  /** Lines to add, work to take off (a credit), or both. */
  @Roles('owner', 'estimator')
  @Post()
  @ApiZodBody(createChangeOrderRequestSchema)
  @ApiJsonResponse(201, 'ChangeOrderView', 'The new change order, priced')
  create(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<ChangeOrderView> {
    return this.orders.create(id, body, user.userId);
  }

  /** To the homeowner who accepted the quote unless `recipientEmail` says otherwise. */
  @Roles('owner', 'estimator')
  @Post(':orderId/send')
  @HttpCode(200)
  @ApiZodBody(sendInvoiceRequestSchema)
  @ApiJsonResponse(200, 'ChangeOrderView', 'Sent for the homeowner’s answer; the e-mail is queued')
  send(
    @Param('id') id: string,
    @Param('orderId') orderId: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<ChangeOrderView> {
    return this.orders.send(id, orderId, body, user.userId);
  }
}
