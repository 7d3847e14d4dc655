import type { DailyLogView } from '@pondwright/shared';
import { AppError } from '../common/errors/app-error';

/**
 * An edit of a daily log made from an older copy than the stored one (two phones, or an offline edit of
 * a log changed since). Answered 409 with `current`, the stored log, so the phone can show both.
 */
export class LogConflictError extends AppError {
  constructor(current: DailyLogView) {
    super(
      'LOG_CONFLICT',
      `This day's log was changed by ${current.authorName || 'someone else'} since your copy (now revision ${current.revision}). Compare and choose which to keep.`,
      undefined,
      { current },
    );
  }
}
