import { QueryRunnerAlreadyReleasedError, QueryRunnerProviderAlreadyReleasedError } from 'typeorm';

/**
 * Whether an error means a service the server depends on (PostgreSQL above all, or the file store)
 * cannot be reached right now, rather than that a request or query was wrong.
 *
 * - Socket errors from node-postgres: refused, reset, unreachable, or no connection within
 *   `connectionTimeoutMillis` (data-source-options.ts).
 * - SQLSTATE classes 08 (connection exception) and 57P01–57P03 (the server shutting down or starting
 *   up), from the PostgreSQL manual, Appendix A "PostgreSQL Error Codes".
 * - TypeORM's QueryRunner(Provider)AlreadyReleasedError: when PostgreSQL ends a connection between
 *   two queries of a transaction (a shutdown while the server computes), TypeORM releases the
 *   transaction's query runner on the connection's `error` event, and the next query throws one of
 *   these instead of the connection error. Found by test/durability.e2e-spec.ts, where they answered
 *   500 mid-outage.
 */
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EHOSTUNREACH', 'ETIMEDOUT', 'EPIPE']);
const SHUTDOWN_STATES = new Set(['57P01', '57P02', '57P03']);
const CONNECTION_MESSAGES = [
  'timeout exceeded when trying to connect',
  'Connection terminated',
  'Client has encountered a connection error',
];

type MaybeDriverError = {
  code?: unknown;
  message?: unknown;
  driverError?: MaybeDriverError;
  cause?: unknown;
};

export function isServiceUnavailable(exception: unknown, depth = 0): boolean {
  if (typeof exception !== 'object' || exception === null || depth > 3) return false;
  if (
    exception instanceof QueryRunnerAlreadyReleasedError ||
    exception instanceof QueryRunnerProviderAlreadyReleasedError
  ) {
    return true;
  }
  const error = exception as MaybeDriverError;
  const code = typeof error.code === 'string' ? error.code : '';
  if (SOCKET_CODES.has(code) || SHUTDOWN_STATES.has(code) || code.startsWith('08')) return true;
  const message = typeof error.message === 'string' ? error.message : '';
  if (CONNECTION_MESSAGES.some((text) => message.includes(text))) return true;
  return (
    isServiceUnavailable(error.driverError, depth + 1) ||
    isServiceUnavailable(error.cause, depth + 1)
  );
}
