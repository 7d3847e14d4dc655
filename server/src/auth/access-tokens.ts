import type { Role } from '@pondwright/shared';

/** Pinned so a token signed any other way (`none`, RS256 with the secret as a public key) is refused. */
export const JWT_ALGORITHM = 'HS256';
export const JWT_ISSUER = 'pondwright';
export const JWT_AUDIENCE = 'pondwright-api';

/** The claims of an access token: who, in which company, with which role at the time of issue. */
export type AccessTokenClaims = {
  sub: string;
  cid: string;
  role: Role;
};
