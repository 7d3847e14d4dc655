import { Controller, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiNotFoundResponse, ApiTags } from '@nestjs/swagger';
import type { EmailDeliveryView } from '@pondwright/shared';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { CurrentUser, Roles, type Principal } from '../common/decorators/auth.decorators';
import { OutboxService } from './outbox.service';

/** Staff's hand on the outbox: an e-mail the worker gave up on can be sent again. */
@ApiTags('mail')
@ApiBearerAuth()
@Roles('owner', 'estimator')
@Controller('outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Post(':id/retry')
  @HttpCode(200)
  @ApiJsonResponse(
    200,
    'EmailDeliveryView',
    'The e-mail queued again: attempts from zero, same Message-ID',
  )
  @ApiNotFoundResponse({ description: 'No such e-mail in the caller’s company' })
  @ApiConflictResponse({ description: 'MAIL_NOT_FAILED: the e-mail is still queued or was sent' })
  retry(@Param('id') id: string, @CurrentUser() user: Principal): Promise<EmailDeliveryView> {
    return this.outbox.retry(id, user.companyId, user.userId);
  }
}
