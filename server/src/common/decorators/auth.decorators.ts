import { createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '@pondwright/shared';
import type { Request } from 'express';

export const PUBLIC_KEY = 'pondwright:public';
export const ROLES_KEY = 'pondwright:roles';

/** The route needs no sign-in (sign-up, sign-in, invite preview, health). */
export const Public = () => SetMetadata(PUBLIC_KEY, true);

/** The roles allowed on a route. Every route that is not @Public must say which roles it allows. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);

/** Everyone signed in to a company. */
export const AnyRole = () => Roles('owner', 'estimator', 'crew_lead');

/** Who is calling, as established by the access token and checked against the database. */
export type Principal = {
  userId: string;
  companyId: string;
  role: Role;
  email: string;
};

export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): Principal => {
    const request = context.switchToHttp().getRequest<Request & { user?: Principal }>();
    if (!request.user) throw new Error('CurrentUser used on a route without authentication');
    return request.user;
  },
);
