import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { ChangeOrderView } from '@pondwright/shared';
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
  list(@Param('id') id: string): Promise<ChangeOrderView[]> {
    return this.orders.list(id);
  }

  /** Body: `createChangeOrderRequestSchema`: lines to add, work to take off (a credit), or both. */
  @Roles('owner', 'estimator')
  @Post()
  create(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<ChangeOrderView> {
    return this.orders.create(id, body, user.userId);
  }

  /** Body: `{recipientEmail?}`; the homeowner who accepted the quote by default. */
  @Roles('owner', 'estimator')
  @Post(':orderId/send')
  @HttpCode(200)
  send(
    @Param('id') id: string,
    @Param('orderId') orderId: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<ChangeOrderView> {
    return this.orders.send(id, orderId, body, user.userId);
  }
}
