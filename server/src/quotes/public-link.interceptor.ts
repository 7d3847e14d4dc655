import {
  Injectable,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import { catchError, from, switchMap, throwError, type Observable } from 'rxjs';
import { AppError } from '../common/errors/app-error';
import { WrongTokenThrottle } from './wrong-token-throttle.service';

/**
 * Around every public link route: answers are never stored by a browser or proxy (each carries the
 * homeowner's name and prices; set before the handler so refusals carry it too), an address that has
 * tried too many wrong tokens gets 429, and each wrong token is counted.
 */
@Injectable()
export class PublicLinkInterceptor implements NestInterceptor {
  constructor(private readonly throttle: WrongTokenThrottle) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const http = context.switchToHttp();
    const request = http.getRequest<Request>();
    http.getResponse<Response>().setHeader('Cache-Control', 'no-store');
    const ip = request.ip ?? 'unknown';
    return from(this.throttle.assertAllowed(ip)).pipe(
      switchMap(() => next.handle()),
      catchError((error: unknown) => {
        if (!(error instanceof AppError && error.code === 'QUOTE_NOT_FOUND')) {
          return throwError(() => error);
        }
        return from(this.throttle.recordFailure(ip)).pipe(switchMap(() => throwError(() => error)));
      }),
    );
  }
}
