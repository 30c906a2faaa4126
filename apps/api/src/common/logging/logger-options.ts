import type { Params } from 'nestjs-pino';
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';

export const REQUEST_ID_HEADER = 'x-request-id';
const ACCEPTABLE_REQUEST_ID = /^[\w.:-]{1,128}$/;

/** Reuses a sane incoming request id (from a proxy) or makes one, and echoes it back. */
export function requestId(request: IncomingMessage, response: ServerResponse): string {
  const incoming = request.headers[REQUEST_ID_HEADER];
  const id = typeof incoming === 'string' && ACCEPTABLE_REQUEST_ID.test(incoming) ? incoming : randomUUID();
  response.setHeader(REQUEST_ID_HEADER, id);
  return id;
}

/** JSON lines on stdout; secrets never reach the log. */
export function loggerOptions(level: string): Params {
  return {
    pinoHttp: {
      level,
      genReqId: requestId,
      redact: {
        paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
        censor: '[redacted]',
      },
      customLogLevel: (_request, response, error) =>
        error || response.statusCode >= 500 ? 'error' : response.statusCode >= 400 ? 'warn' : 'info',
    },
  };
}
