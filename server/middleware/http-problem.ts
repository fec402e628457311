import type { Request, Response } from 'express';
import { PROBLEM_CONTENT_TYPE, type Problem } from '../../shared/api/problem';

/** Thrown (or passed to next) by routes and services; the error handler turns it into a response. */
export class HttpProblem extends Error {
  constructor(
    readonly problem: Problem,
    readonly headers: Record<string, string> = {},
  ) {
    super(problem.detail ?? problem.title);
    this.name = 'HttpProblem';
  }
}

export function sendProblem(req: Request, res: Response, problem: Problem, headers: Record<string, string> = {}): void {
  res.status(problem.status);
  for (const [name, value] of Object.entries(headers)) res.setHeader(name, value);
  // Errors are about this one request; a cache must not replay them.
  res.setHeader('Cache-Control', 'no-store');
  res.type(PROBLEM_CONTENT_TYPE).send(JSON.stringify({ ...problem, instance: problem.instance ?? req.originalUrl }));
}
