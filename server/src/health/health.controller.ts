import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { Public } from '../common/decorators/auth.decorators';

const DATABASE_CHECK_TIMEOUT_MS = 2000;
const STATUS_OK_SCHEMA = {
  type: 'object',
  properties: { status: { type: 'string', enum: ['ok'] } },
  required: ['status'],
  example: { status: 'ok' },
};

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /**
   * Alive: the process answers, whatever the state of the database. An orchestrator restarts a server
   * that fails this, so it must not fail when only PostgreSQL is away (the server reconnects by itself).
   */
  @Public()
  @Get('live')
  @ApiOkResponse({ schema: STATUS_OK_SCHEMA, description: 'The process answers' })
  live(): { status: 'ok' } {
    return { status: 'ok' };
  }

  /**
   * Ready to serve: the database answers a query within two seconds. A load balancer sends no traffic to
   * a server that fails this. `/api/health` is the same check, kept for the start and test scripts.
   */
  @Public()
  @Get(['', 'ready'])
  @ApiOkResponse({ schema: STATUS_OK_SCHEMA, description: 'The database answers' })
  @ApiServiceUnavailableResponse({ description: 'The database is not answering' })
  async check(): Promise<{ status: 'ok' }> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('timeout')), DATABASE_CHECK_TIMEOUT_MS);
    });
    try {
      await Promise.race([this.dataSource.query('SELECT 1'), timeout]);
      return { status: 'ok' };
    } catch {
      throw new ServiceUnavailableException('The database is not answering');
    } finally {
      clearTimeout(timer);
    }
  }
}
