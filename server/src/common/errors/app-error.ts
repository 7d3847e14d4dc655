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
  ESTIMATE_LOCKED: HttpStatus.CONFLICT,
  ESTIMATE_NOT_SENDABLE: HttpStatus.CONFLICT,
  CUSTOMER_HAS_NO_EMAIL: HttpStatus.BAD_REQUEST,
  QUOTE_NOT_FOUND: HttpStatus.NOT_FOUND,
  QUOTE_LINK_EXPIRED: HttpStatus.GONE,
  QUOTE_LINK_REVOKED: HttpStatus.GONE,
  QUOTE_VERSION_CHANGED: HttpStatus.CONFLICT,
  QUOTE_ALREADY_ANSWERED: HttpStatus.CONFLICT,
  QUOTE_NOT_ACCEPTED: HttpStatus.CONFLICT,
  DEPOSIT_ALREADY_PAID: HttpStatus.CONFLICT,
  PAYMENT_PROVIDER_UNAVAILABLE: HttpStatus.BAD_GATEWAY,
  MAILBOX_UNAVAILABLE: HttpStatus.BAD_GATEWAY,
  MAIL_NOT_FAILED: HttpStatus.CONFLICT,
  WEBHOOK_SIGNATURE_INVALID: HttpStatus.BAD_REQUEST,
  LOGO_INVALID: HttpStatus.BAD_REQUEST,
  LOGO_NOT_FOUND: HttpStatus.NOT_FOUND,
  CREW_NAME_TAKEN: HttpStatus.CONFLICT,
  JOB_EXISTS: HttpStatus.CONFLICT,
  ESTIMATE_NOT_ACCEPTED: HttpStatus.CONFLICT,
  JOB_STATUS_CHANGE: HttpStatus.CONFLICT,
  JOB_CLOSED: HttpStatus.CONFLICT,
  LOG_CONFLICT: HttpStatus.CONFLICT,
  FORBIDDEN: HttpStatus.FORBIDDEN,
  PHOTO_STORE_UNAVAILABLE: HttpStatus.BAD_GATEWAY,
  PHOTO_NOT_AN_IMAGE: HttpStatus.BAD_REQUEST,
  PHOTO_TOO_LARGE: HttpStatus.PAYLOAD_TOO_LARGE,
  PHOTO_ID_TAKEN: HttpStatus.CONFLICT,
  NOTHING_LEARNED: HttpStatus.CONFLICT,
  JOB_NOT_COMPLETE: HttpStatus.CONFLICT,
  INVOICE_PAID: HttpStatus.CONFLICT,
  CUSTOMER_HAS_ESTIMATES: HttpStatus.CONFLICT,
  CREDIT_EXCEEDS_PAID: HttpStatus.CONFLICT,
  JOB_INVOICED: HttpStatus.CONFLICT,
  CHANGE_ORDER_SUPERSEDED: HttpStatus.CONFLICT,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: Array<{ field: string; message: string }>,
    /** More members for the error body, e.g. the stored copy a conflicting edit is told about. */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
