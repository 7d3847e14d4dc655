import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { InvoiceView } from '@pondwright/shared';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { InvoicesService } from './invoices.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@Controller('jobs/:id/invoice')
export class InvoicesController {
  constructor(private readonly invoices: InvoicesService) {}

  @Get()
  get(@Param('id') id: string): Promise<InvoiceView> {
    return this.invoices.get(id);
  }

  /** Body: `sendInvoiceRequestSchema`. Issues the final invoice, or sends it again. */
  @Post()
  send(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<InvoiceView> {
    return this.invoices.send(id, body, user.userId);
  }
}
