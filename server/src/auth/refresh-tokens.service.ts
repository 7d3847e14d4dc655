import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, IsNull, type EntityManager } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { AppError } from '../common/errors/app-error';
import { RefreshToken } from './entities/refresh-token.entity';
import { hashToken, newSecureToken } from './secure-token';

export type IssuedRefreshToken = { token: string; expiresAt: Date };

/**
 * Refresh tokens rotate on every use (OAuth 2.0 Security BCP, RFC 9700 §4.14.2): each use marks the
 * token used and issues its successor in the same family. Presenting a token that was already used means
 * it was copied, so the whole family is revoked and everyone holding it must sign in again.
 */
@Injectable()
export class RefreshTokensService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly config: AppConfig,
  ) {}

  /** Starts a new family for a fresh sign-in. */
  issue(
    userId: string,
    manager: EntityManager = this.dataSource.manager,
  ): Promise<IssuedRefreshToken> {
    return this.insert(manager, userId, randomUUID());
  }

  /** Uses a token once: returns its user and the successor, or throws 401 (revoking the family on reuse). */
  async rotate(presented: string): Promise<{ userId: string; next: IssuedRefreshToken }> {
    const outcome = await this.dataSource.transaction(async (manager) => {
      const current = await manager.findOne(RefreshToken, {
        where: { tokenHash: hashToken(presented) },
        lock: { mode: 'pessimistic_write' },
      });
      if (!current) return { kind: 'unknown' as const };
      if (current.usedAt || current.revokedAt)
        return { kind: 'reused' as const, familyId: current.familyId };
      if (current.expiresAt.getTime() <= Date.now()) return { kind: 'expired' as const };
      current.usedAt = new Date();
      await manager.save(current);
      const next = await this.insert(manager, current.userId, current.familyId);
      return { kind: 'rotated' as const, userId: current.userId, next };
    });
    if (outcome.kind === 'rotated') return { userId: outcome.userId, next: outcome.next };
    if (outcome.kind === 'reused') await this.revokeFamily(outcome.familyId);
    throw new AppError('SESSION_EXPIRED', 'Your session has ended. Please sign in again.');
  }

  /** Sign-out: the family of the presented token ends. Unknown tokens are ignored. */
  async revokeByToken(presented: string): Promise<void> {
    const token = await this.dataSource.manager.findOneBy(RefreshToken, {
      tokenHash: hashToken(presented),
    });
    if (token) await this.revokeFamily(token.familyId);
  }

  async revokeFamily(familyId: string): Promise<void> {
    await this.dataSource.manager.update(
      RefreshToken,
      { familyId, revokedAt: IsNull() },
      { revokedAt: new Date() },
    );
  }

  /** Deactivation and role changes end every session of the user. */
  async revokeAllForUser(
    userId: string,
    manager: EntityManager = this.dataSource.manager,
  ): Promise<void> {
    await manager.update(RefreshToken, { userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async insert(
    manager: EntityManager,
    userId: string,
    familyId: string,
  ): Promise<IssuedRefreshToken> {
    const token = newSecureToken();
    const expiresAt = new Date(Date.now() + this.config.refreshTtlDays * 24 * 3600 * 1000);
    await manager.insert(RefreshToken, {
      userId,
      familyId,
      tokenHash: hashToken(token),
      expiresAt,
    });
    return { token, expiresAt };
  }
}
