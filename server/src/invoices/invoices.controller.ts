import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { sendInvoiceRequestSchema, type InvoiceView } from '@pondwright/shared';
import { ApiJsonResponse, ApiZodBody } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { InvoicesService } from './invoices.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@Controller('jobs/:id/invoice')
export class InvoicesController {
  constructor(private readonly invoices: InvoicesService) {}

  @Get()
  @ApiJsonResponse(200, 'InvoiceView', 'The job’s final invoice: the balance due after the deposit')
  get(@Param('id') id: string): Promise<InvoiceView> {
    return this.invoices.get(id);
  }

  /** Issues the final invoice, or sends it again. */
  @Post()
  @ApiZodBody(sendInvoiceRequestSchema)
  @ApiJsonResponse(201, 'InvoiceView', 'Issued (or sent again); the e-mail is queued')
  send(
    @Param('id') id: string,
    @Body() body: unknown,
    @CurrentUser() user: Principal,
  ): Promise<InvoiceView> {
    return this.invoices.send(id, body, user.userId);
  }
}
