import {
  ArgumentsHost,
  Catch,
  ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import type { ApiErrorBody } from '@pondwright/shared';
import type { NextFunction, Request, Response } from 'express';
import { STATUS_CODES } from 'node:http';
import { AppError } from '../errors/app-error';
import { isServiceUnavailable } from './service-unavailable';

type FieldDetail = { field: string; message: string };

/**
 * Turns every error into `{statusCode, error, message, details?, code?, requestId}`; nothing else ever
 * reaches a client. The request id ties a complaint to its line in the log.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    this.reply(exception, host.switchToHttp().getResponse<Response>());
  }

  /**
   * Express error middleware with the same behaviour, for errors raised before Nest's pipeline (the JSON
   * body parser: malformed JSON, a body over the size limit).
   */
  readonly middleware = (
    error: unknown,
    _request: Request,
    response: Response,
    next: NextFunction,
  ): void => {
    if (response.headersSent) return next(error);
    this.reply(error, response);
  };

  private reply(exception: unknown, response: Response): void {
    const body = this.toBody(exception);
    const requestId = response.getHeader('x-request-id');
    if (typeof requestId === 'string') body.requestId = requestId;
    if (body.statusCode >= 500) {
      this.logger.error(
        exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
      );
    }
    if (response.headersSent) return;
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ApiErrorBody {
    if (exception instanceof AppError) {
      return {
        ...this.body(exception.status, exception.message, exception.details, exception.code),
        ...exception.extra,
      };
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const payload = exception.getResponse();
      if (typeof payload === 'object' && payload !== null) {
        const { message, details } = payload as { message?: unknown; details?: FieldDetail[] };
        const text = Array.isArray(message)
          ? message.join('; ')
          : typeof message === 'string'
            ? message
            : exception.message;
        return this.body(status, text, details);
      }
      return this.body(status, String(payload));
    }
    // A unique index refused a duplicate that slipped past the service's own check (two requests at once).
    if ((exception as { driverError?: { code?: string } })?.driverError?.code === '23505') {
      return this.body(HttpStatus.CONFLICT, 'This already exists.');
    }
    // PostgreSQL (or the file store) is down, restarting or not answering: an outage to retry, not a bug.
    if (isServiceUnavailable(exception)) {
      return this.body(
        HttpStatus.SERVICE_UNAVAILABLE,
        'Pondwright cannot reach a service it depends on just now. Please try again in a minute.',
      );
    }
    // body-parser's errors carry an HTTP status and a type; a syntax error in the JSON is the client's.
    const parserError = exception as { status?: number; type?: string };
    if (
      typeof parserError?.status === 'number' &&
      parserError.status >= 400 &&
      parserError.status < 500
    ) {
      if (parserError.type === 'entity.parse.failed') {
        return this.body(HttpStatus.BAD_REQUEST, 'The request body is not valid JSON');
      }
      if (parserError.type === 'entity.too.large') {
        return this.body(HttpStatus.PAYLOAD_TOO_LARGE, 'The request body is too large');
      }
      return this.body(parserError.status, STATUS_CODES[parserError.status] ?? 'Bad request');
    }
    return this.body(
      HttpStatus.INTERNAL_SERVER_ERROR,
      'Something went wrong on our side. Please try again.',
    );
  }

  private body(
    statusCode: number,
    message: string,
    details?: FieldDetail[],
    code?: string,
  ): ApiErrorBody {
    const body: ApiErrorBody & { code?: string } = {
      statusCode,
      error: STATUS_CODES[statusCode] ?? 'Error',
      message,
    };
    if (details?.length) body.details = details;
    if (code) body.code = code;
    return body;
  }
}
