import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { ThrottlerException } from '@nestjs/throttler';
import { Repository } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { LoginFailure } from './entities/login-failure.entity';

/**
 * Counts failed sign-ins per account and per IP address in a sliding window (OWASP ASVS V2.2.1). Counts
 * live in PostgreSQL so they hold across restarts and across server instances.
 */
@Injectable()
export class LoginThrottleService {
  constructor(
    @InjectRepository(LoginFailure) private readonly failures: Repository<LoginFailure>,
    private readonly config: AppConfig,
  ) {}

  /** Throws 429 when the account or the address has used up its failures in the window. */
  async assertAllowed(email: string, ip: string): Promise<void> {
    const { maxFailures, windowMinutes } = this.config.loginThrottle;
    const [row] = (await this.failures.query(
      `SELECT
         count(*) FILTER (WHERE email_key = $1)::int AS by_account,
         count(*) FILTER (WHERE ip = $2)::int AS by_ip
       FROM login_failures
       WHERE created_at > now() - make_interval(mins => $3) AND (email_key = $1 OR ip = $2)`,
      [email, ip, windowMinutes],
    )) as Array<{ by_account: number; by_ip: number }>;
    if (row && (row.by_account >= maxFailures || row.by_ip >= maxFailures)) {
      throw new ThrottlerException(
        `Too many failed sign-ins. Wait ${windowMinutes} minutes and try again, or ask your company's owner for help.`,
      );
    }
  }

  async recordFailure(email: string, ip: string): Promise<void> {
    await this.failures.insert({ emailKey: email, ip });
  }

  /** A successful sign-in clears the account's failures; the address keeps its count. */
  async clearAccount(email: string): Promise<void> {
    await this.failures.delete({ emailKey: email });
  }
}
