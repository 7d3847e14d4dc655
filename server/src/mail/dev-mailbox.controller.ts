import { Controller, Delete, Get, HttpCode } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { MailboxMessage } from '@pondwright/shared';
import { ApiJsonResponse } from '../common/decorators/api-docs.decorators';
import { Roles } from '../common/decorators/auth.decorators';
import { AppError } from '../common/errors/app-error';
import { AppConfig } from '../config/app-config';

/**
 * The developer mailbox: what the local fake SMTP server caught, for the owner to read while trying
 * the app. Answers 404 in production or when no fake is configured, as if the route did not exist.
 */
@ApiTags('developer')
@ApiBearerAuth()
@Roles('owner')
@Controller('dev/mailbox')
export class DevMailboxController {
  constructor(private readonly config: AppConfig) {}

  @Get()
  @ApiJsonResponse(200, 'MailboxMessage[]', 'Every e-mail the local fake SMTP server caught')
  async list(): Promise<MailboxMessage[]> {
    const response = await this.call('GET');
    return (await response.json()) as MailboxMessage[];
  }

  @Delete()
  @HttpCode(204)
  async clear(): Promise<void> {
    await this.call('DELETE');
  }

  private async call(method: 'GET' | 'DELETE'): Promise<Response> {
    const base = this.config.mailboxUrl;
    if (!base) throw new AppError('NOT_FOUND', 'Not found');
    const response = await fetch(`${base}/messages`, {
      method,
      signal: AbortSignal.timeout(5000),
    }).catch(() => null);
    if (!response?.ok) {
      throw new AppError(
        'MAILBOX_UNAVAILABLE',
        'The local fake mailbox is not answering; is it running?',
      );
    }
    return response;
  }
}
