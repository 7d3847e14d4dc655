import { ArgumentsHost, Catch, type ExceptionFilter, HttpStatus } from '@nestjs/common';
import type { EstimateDraftView, StaleDraftBody } from '@pondwright/shared';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';
import { AppError } from '../common/errors/app-error';

/**
 * A save or finalise sent from a copy older than the stored draft. It carries the current draft so the
 * client can show what changed instead of overwriting it; nothing is written.
 */
export class StaleDraftError extends AppError {
  constructor(
    readonly current: EstimateDraftView,
    details?: Array<{ field: string; message: string }>,
  ) {
    super(
      'STALE_DRAFT',
      `Someone saved this estimate since you opened it (now revision ${current.revision}). Review their changes, then save again.`,
      details,
    );
  }
}

/**
 * Writes a stale-draft 409 in the one error shape plus `current`; the global filter's shape has no room
 * for it, and every other error still goes there.
 */
@Catch(StaleDraftError)
export class StaleDraftFilter implements ExceptionFilter {
  catch(error: StaleDraftError, host: ArgumentsHost): void {
    const body: StaleDraftBody = {
      statusCode: HttpStatus.CONFLICT,
      error: STATUS_CODES[HttpStatus.CONFLICT]!,
      code: 'STALE_DRAFT',
      message: error.message,
      current: error.current,
    };
    if (error.details?.length) body.details = error.details;
    host.switchToHttp().getResponse<Response>().status(HttpStatus.CONFLICT).json(body);
  }
}
