import { STATUS_CODES } from 'node:http';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import { problemTypes, validationProblem, type Problem } from '../../shared/api/problem';
import { HttpProblem, sendProblem } from './http-problem';

/** Unknown /api paths get a problem, never the client's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  sendProblem(req, res, {
    type: problemTypes.notFound,
    title: 'Not found',
    status: 404,
    detail: `There is no API endpoint ${req.method} ${req.path}.`,
  });
};

/** For a known path asked with a method it does not answer. */
export function methodNotAllowed(allowed: readonly string[]): RequestHandler {
  return (req, res) => {
    sendProblem(
      req,
      res,
      {
        type: problemTypes.methodNotAllowed,
        title: 'Method not allowed',
        status: 405,
        detail: `${req.originalUrl.split('?')[0]} answers ${allowed.join(', ')}, not ${req.method}.`,
      },
      { Allow: allowed.join(', ') },
    );
  };
}

// body-parser (behind express.json) marks its errors with a `type`; these are all the client's.
const bodyParserProblems: Record<string, (error: BodyParserError) => Problem> = {
  'entity.parse.failed': () => ({
    type: problemTypes.malformedJson,
    title: 'Malformed JSON',
    status: 400,
    detail: 'The request body is not valid JSON.',
  }),
  'entity.too.large': (error) => ({
    type: problemTypes.payloadTooLarge,
    title: 'Request body too large',
    status: 413,
    detail: `The request body is ${error.length ?? 'more than the limit of'} bytes; the limit is ${error.limit} bytes.`,
  }),
  'encoding.unsupported': (error) => ({
    type: problemTypes.unsupportedMediaType,
    title: 'Unsupported content encoding',
    status: 415,
    detail: `The content encoding ${error.encoding ?? ''} is not supported; send identity, gzip or deflate.`.replace('  ', ' '),
  }),
  'charset.unsupported': (error) => ({
    type: problemTypes.unsupportedMediaType,
    title: 'Unsupported charset',
    status: 415,
    detail: `The charset ${error.charset ?? ''} is not supported; send UTF-8.`.replace('  ', ' '),
  }),
  'request.aborted': () => ({
    type: problemTypes.generic,
    title: 'Request aborted',
    status: 400,
    detail: 'The client closed the connection before the body was complete.',
  }),
  'request.size.invalid': () => ({
    type: problemTypes.generic,
    title: 'Bad request',
    status: 400,
    detail: 'The request body is shorter or longer than its Content-Length.',
  }),
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  length?: number;
  limit?: number;
  encoding?: string;
  charset?: string;
}

export function problemErrorHandler(logger: Logger): ErrorRequestHandler {
  return (error: unknown, req, res, next) => {
    if (res.headersSent) {
      next(error);
      return;
    }
    if (error instanceof HttpProblem) {
      sendProblem(req, res, error.problem, error.headers);
      return;
    }
    if (error instanceof ZodError) {
      sendProblem(req, res, validationProblem(error.issues));
      return;
    }
    const bodyError = error as BodyParserError;
    const fromBodyParser = bodyError?.type ? bodyParserProblems[bodyError.type] : undefined;
    if (fromBodyParser) {
      sendProblem(req, res, fromBodyParser(bodyError));
      return;
    }
    // Any other 4xx raised by Express or a library is still the client's; keep its status.
    const status = bodyError?.status;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      sendProblem(req, res, {
        type: problemTypes.generic,
        title: STATUS_CODES[status] ?? 'Bad request',
        status,
        detail: bodyError.message,
      });
      return;
    }
    logger.error({ err: error, reqId: req.id, method: req.method, url: req.originalUrl }, 'unhandled error');
    sendProblem(req, res, {
      type: problemTypes.internal,
      title: 'Internal server error',
      status: 500,
      detail: 'Something went wrong on our side; the error has been logged.',
    });
  };
}
