import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

interface SerializedRequest {
  id: unknown;
  method: string;
  url: string;
  headers: IncomingMessage['headers'];
  remoteAddress?: string;
}

/**
 * Named fields only: no header map is copied into the log, so cookies, keys and tokens cannot
 * reach it (nothing to redact), and no request pays for serialising and cloning every header.
 */
const requestFields = (req: SerializedRequest) => ({
  id: req.id,
  method: req.method,
  url: req.url,
  remoteAddress: req.remoteAddress,
  userAgent: req.headers['user-agent'],
});

const responseFields = (res: { statusCode: number | null; headers?: Record<string, unknown> }) => ({
  statusCode: res.statusCode,
  contentLength: res.headers?.['content-length'],
});

export function requestLogging(logger: Logger) {
  return pinoHttp({
    logger,
    genReqId: (req: IncomingMessage) => {
      const given = req.headers['x-request-id'];
      return typeof given === 'string' && /^[\w.-]{1,128}$/.test(given) ? given : randomUUID();
    },
    customLogLevel: (_req, res, error) => {
      if (error || res.statusCode >= 500) return 'error';
      if (res.statusCode >= 400) return 'warn';
      return 'info';
    },
    serializers: { req: requestFields, res: responseFields },
  });
}
