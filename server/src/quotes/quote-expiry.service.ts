import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { expireLapsedQuotes } from './quote-expiry';

const SWEEP_EVERY_MS = 60_000;

/**
 * Moves quotes whose links lapsed unanswered to `expired` once a minute, so the estimates list tells
 * the truth without waiting for someone to open a dead link. Runs where the outbox worker runs.
 */
@Injectable()
export class QuoteExpiryService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(QuoteExpiryService.name);
  private timer: NodeJS.Timeout | null = null;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.config.outbox.workerEnabled) return;
    this.timer = setInterval(() => void this.sweep(), SWEEP_EVERY_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  async sweep(): Promise<number> {
    try {
      return await expireLapsedQuotes(this.dataSource.manager);
    } catch (error) {
      this.logger.warn(`Quote expiry sweep failed: ${(error as Error).message}`);
      return 0;
    }
  }
}
