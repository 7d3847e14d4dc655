import type { Params } from 'nestjs-pino';
import { randomUUID } from 'node:crypto';
import type { Options } from 'pino-http';
import type { AppConfig } from '../../config/app-config';
import { redactRequestForLog } from './redact-request';

const REQUEST_ID = /^[A-Za-z0-9._-]{1,64}$/;

/**
 * How the server logs: pino's JSON lines on standard output, each line of a request carrying its id
 * as `req.id` (also sent back as `X-Request-Id`). Tokens, cookies and passwords never reach the log.
 */
export function loggerParams(config: AppConfig): Params & { pinoHttp: Options } {
  return {
    pinoHttp: {
      level: config.logLevel,
      genReqId: (request, response) => {
        // A caller's (or proxy's) id is kept only when it is a plain token, so it cannot forge log lines.
        const given = request.headers['x-request-id'];
        const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
        response.setHeader('x-request-id', id);
        return id;
      },
      redact: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
      autoLogging: { ignore: (request) => request.url?.startsWith('/api/health') ?? false },
      serializers: { req: redactRequestForLog },
    },
  };
}
