import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { AppError } from '../common/errors/app-error';
import type { Principal } from '../common/decorators/auth.decorators';
import { TenantContext } from '../common/tenancy/tenant-context';
import { User } from '../users/entities/user.entity';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER, type AccessTokenClaims } from './access-tokens';

/**
 * Checks the bearer token (signature, algorithm, issuer, audience, expiry), then the user it names: a
 * deactivated user is refused at once, and the role comes from the database so a change applies
 * immediately. Sets the request's company for the tenant repository.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    config: AppConfig,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly tenant: TenantContext,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.jwt.secret,
      algorithms: [JWT_ALGORITHM],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
      ignoreExpiration: false,
    });
  }

  async validate(claims: AccessTokenClaims): Promise<Principal> {
    const user = await this.users.findOneBy({ id: claims.sub });
    if (!user || !user.active || user.companyId !== claims.cid) {
      throw new AppError('SESSION_EXPIRED', 'Your session has ended. Please sign in again.');
    }
    this.tenant.enter(user.companyId);
    return { userId: user.id, companyId: user.companyId, role: user.role, email: user.email };
  }
}
