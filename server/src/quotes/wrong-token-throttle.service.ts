import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { ThrottlerException } from '@nestjs/throttler';
import { DataSource } from 'typeorm';

/**
 * Wrong quote-link tokens allowed per address in the window before every public link answers 429.
 * A homeowner mistyping or half-copying a link needs a handful; guessing a 256-bit token needs
 * astronomically many, so the limit costs a person nothing and a scanner everything.
 */
export const WRONG_TOKEN_LIMIT = 20;
export const WRONG_TOKEN_WINDOW_MINUTES = 15;

/**
 * Counts requests whose token matches no link, per IP address, in PostgreSQL (so every server instance
 * sees the same count). Revoked and expired links are real links and are not counted.
 */
@Injectable()
export class WrongTokenThrottle {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async isBlocked(ip: string): Promise<boolean> {
    const [row] = (await this.dataSource.query(
      `SELECT count(*)::int AS failures FROM quote_token_failures
       WHERE ip = $1 AND created_at > now() - make_interval(mins => $2)`,
      [ip, WRONG_TOKEN_WINDOW_MINUTES],
    )) as Array<{ failures: number }>;
    return (row?.failures ?? 0) >= WRONG_TOKEN_LIMIT;
  }

  async assertAllowed(ip: string): Promise<void> {
    if (await this.isBlocked(ip)) {
      throw new ThrottlerException(
        `Too many links that do not exist were tried from this address. Wait ${WRONG_TOKEN_WINDOW_MINUTES} minutes, then open the link from the e-mail again.`,
      );
    }
  }

  /** Records one wrong token; the address's rows older than the window go at the same time. */
  async recordFailure(ip: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await manager.query(
        `DELETE FROM quote_token_failures
         WHERE ip = $1 AND created_at <= now() - make_interval(mins => $2)`,
        [ip, WRONG_TOKEN_WINDOW_MINUTES],
      );
      await manager.query(`INSERT INTO quote_token_failures (ip) VALUES ($1)`, [ip]);
    });
  }
}
