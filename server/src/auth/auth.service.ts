import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import type { CurrentUser, Role } from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { Company } from '../companies/entities/company.entity';
import { InvitesService } from '../invites/invites.service';
import { addStarterPriceBook } from '../price-book/starter-price-book';
import { User } from '../users/entities/user.entity';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER, type AccessTokenClaims } from './access-tokens';
import type { AcceptInviteDto, LoginDto, SignupDto } from './dto/auth.dto';
import { LoginThrottleService } from './login-throttle.service';
import { hashPassword, verifyPassword } from './passwords';
import { RefreshTokensService, type IssuedRefreshToken } from './refresh-tokens.service';

export type Session = { accessToken: string; refresh: IssuedRefreshToken };

const INVALID_CREDENTIALS = 'The e-mail or password is not right.';

/**
 * Sign-up, sign-in, session refresh and sign-out. These run before a company is known, so they use the
 * plain repositories; everything after sign-in goes through the tenant repository.
 */
@Injectable()
export class AuthService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly loginThrottle: LoginThrottleService,
    private readonly invites: InvitesService,
  ) {}

  /** Creates a company, its first owner and its starter price book, and signs the owner in. */
  async signup(input: SignupDto): Promise<Session> {
    const passwordHash = await hashPassword(input.password);
    return this.dataSource.transaction(async (manager) => {
      await this.assertEmailFree(manager, input.email);
      const company = await manager.save(manager.create(Company, { name: input.companyName }));
      const user = await manager.save(
        manager.create(User, {
          companyId: company.id,
          email: input.email,
          name: input.name,
          role: 'owner',
          passwordHash,
        }),
      );
      await addStarterPriceBook(manager, company.id, user.id);
      return this.startSession(user, manager);
    });
  }

  async login(input: LoginDto, ip: string): Promise<Session> {
    const email = input.email;
    await this.loginThrottle.assertAllowed(email, ip);
    const user = await this.dataSource.manager
      .createQueryBuilder(User, 'user')
      .addSelect('user.passwordHash')
      .where('user.email = :email', { email })
      .getOne();
    const passwordOk = await verifyPassword(input.password, user?.passwordHash);
    if (!user || !passwordOk) {
      await this.loginThrottle.recordFailure(email, ip);
      throw new AppError('INVALID_CREDENTIALS', INVALID_CREDENTIALS);
    }
    await this.loginThrottle.clearAccount(email);
    if (!user.active) {
      throw new AppError(
        'ACCOUNT_DEACTIVATED',
        "This account has been deactivated. Ask your company's owner.",
      );
    }
    return this.startSession(user);
  }

  /** Trades a refresh token for a new access token and the token's successor. */
  async refresh(presented: string | undefined): Promise<Session> {
    if (!presented) throw new AppError('SESSION_EXPIRED', 'Please sign in.');
    const { userId, next } = await this.refreshTokens.rotate(presented);
    const user = await this.dataSource.manager.findOneBy(User, { id: userId });
    if (!user || !user.active) {
      await this.refreshTokens.revokeAllForUser(userId);
      throw new AppError('SESSION_EXPIRED', 'Your session has ended. Please sign in again.');
    }
    return { accessToken: await this.signAccessToken(user), refresh: next };
  }

  async logout(presented: string | undefined): Promise<void> {
    if (presented) await this.refreshTokens.revokeByToken(presented);
  }

  async me(userId: string): Promise<CurrentUser> {
    const user = await this.dataSource.manager.findOne(User, {
      where: { id: userId },
      relations: { company: true },
    });
    if (!user?.company)
      throw new AppError('SESSION_EXPIRED', 'Your session has ended. Please sign in again.');
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      companyId: user.companyId,
      companyName: user.company.name,
    };
  }

  /** Joins the inviting company with the invite's e-mail and role; the invite is used up in the same step. */
  async acceptInvite(input: AcceptInviteDto): Promise<Session> {
    const passwordHash = await hashPassword(input.password);
    return this.dataSource.transaction(async (manager) => {
      const invite = await this.invites.consume(input.token, manager);
      await this.assertEmailFree(manager, invite.email);
      const user = await manager.save(
        manager.create(User, {
          companyId: invite.companyId,
          email: invite.email,
          name: input.name,
          role: invite.role as Role,
          passwordHash,
        }),
      );
      return this.startSession(user, manager);
    });
  }

  private async assertEmailFree(manager: EntityManager, email: string): Promise<void> {
    if (await manager.existsBy(User, { email })) {
      throw new AppError(
        'EMAIL_TAKEN',
        'An account with this e-mail already exists. Sign in instead.',
        [{ field: 'email', message: 'An account with this e-mail already exists' }],
      );
    }
  }

  private async startSession(user: User, manager?: EntityManager): Promise<Session> {
    const refresh = await this.refreshTokens.issue(user.id, manager);
    return { accessToken: await this.signAccessToken(user), refresh };
  }

  private signAccessToken(user: User): Promise<string> {
    const claims: AccessTokenClaims = { sub: user.id, cid: user.companyId, role: user.role };
    return this.jwt.signAsync(claims, {
      algorithm: JWT_ALGORITHM,
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
    });
  }
}
