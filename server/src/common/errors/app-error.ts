import { HttpStatus } from '@nestjs/common';

/**
 * A failure the client can act on, with a stable code. The exception filter turns it into the one JSON
 * error shape with the status below; services throw these instead of picking HTTP statuses themselves.
 */
export const ERROR_STATUS = {
  EMAIL_TAKEN: HttpStatus.CONFLICT,
  LAST_OWNER: HttpStatus.CONFLICT,
  INVITE_NOT_FOUND: HttpStatus.NOT_FOUND,
  INVITE_EXPIRED: HttpStatus.GONE,
  INVALID_CREDENTIALS: HttpStatus.UNAUTHORIZED,
  ACCOUNT_DEACTIVATED: HttpStatus.UNAUTHORIZED,
  SESSION_EXPIRED: HttpStatus.UNAUTHORIZED,
  NOT_FOUND: HttpStatus.NOT_FOUND,
  PRICE_BOOK_NOT_FOUND: HttpStatus.NOT_FOUND,
  COMMON_PASSWORD: HttpStatus.BAD_REQUEST,
  TOO_MANY_ATTEMPTS: HttpStatus.TOO_MANY_REQUESTS,
  STALE_DRAFT: HttpStatus.CONFLICT,
  ESTIMATE_NOT_FINALISABLE: HttpStatus.CONFLICT,
  ESTIMATE_NOT_AWAITING_APPROVAL: HttpStatus.CONFLICT,
  ESTIMATE_VERSION_NOT_FOUND: HttpStatus.NOT_FOUND,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: Array<{ field: string; message: string }>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
