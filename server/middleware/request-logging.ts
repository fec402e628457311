import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

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
    // Keep cookies and keys out of the log.
    redact: ['req.headers.cookie', 'req.headers.authorization', 'req.headers["x-api-key"]', 'res.headers["set-cookie"]'],
  });
}
