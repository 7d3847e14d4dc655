import {
  CanActivate,
  ExecutionContext,
  ForbiddenException,
  Injectable,
  Logger,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@pondwright/shared';
import type { Request } from 'express';
import { PUBLIC_KEY, ROLES_KEY, type Principal } from '../decorators/auth.decorators';

/**
 * Global, after authentication: the caller's role must be one the route names. A route that names no roles
 * is refused (fail closed) so a forgotten decorator can never open a route to everyone.
 */
@Injectable()
export class RolesGuard implements CanActivate {
  private readonly logger = new Logger(RolesGuard.name);

  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(PUBLIC_KEY, targets)) return true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!roles?.length) {
      this.logger.error(
        `Route ${context.getClass().name}.${context.getHandler().name} declares no roles`,
      );
      throw new ForbiddenException('This route is not open to any role');
    }
    const user = context.switchToHttp().getRequest<Request & { user?: Principal }>().user;
    if (!user || !roles.includes(user.role)) {
      throw new ForbiddenException('Your role does not allow this');
    }
    return true;
  }
}
