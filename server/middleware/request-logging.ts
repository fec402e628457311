import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

declare module 'express-serve-static-core' {
  interface Request {
    /** The request's id: a sane X-Request-Id from the caller, else a new UUID. */
    id?: string;
  }
}

/**
 * One line per request when its response is done: method, path, status, length, time, id.
 * Named fields only: no header map is copied into the log, so cookies, keys and tokens cannot
 * reach it. Written by hand instead of pino-http, which serialises a child logger's bindings
 * for every request before anything is logged; here nothing is built unless the level is on.
 */
export function requestLogging(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const given = req.headers['x-request-id'];
    req.id = typeof given === 'string' && /^[\w.-]{1,128}$/.test(given) ? given : randomUUID();
    const started = performance.now();
    let done = false;
    const finish = () => {
      if (done) return;
      done = true;
      const aborted = !res.writableFinished;
      const level = res.statusCode >= 500 ? 'error' : res.statusCode >= 400 || aborted ? 'warn' : 'info';
      if (!logger.isLevelEnabled(level)) return;
      logger[level](
        {
          req: { id: req.id, method: req.method, url: req.originalUrl, remoteAddress: req.socket.remoteAddress, userAgent: req.headers['user-agent'] },
          res: { statusCode: res.statusCode, contentLength: res.getHeader('content-length') },
          responseTime: Math.round(performance.now() - started),
        },
        aborted ? 'request aborted' : 'request completed',
      );
    };
    res.once('finish', finish);
    res.once('close', finish);
    next();
  };
}
