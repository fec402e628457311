import {
  fieldErrorsFromZodIssues,
  PROBLEM_CONTENT_TYPE,
  problemSchema,
  type Problem,
  type ProblemFieldError,
} from '../../shared/api/problem';
import type { z } from './zod';

/** RFC 9457 problem details as the client holds them: `errors` always present. */
export type ProblemDetails = Problem & { errors: ProblemFieldError[] };

/** Every failed API call surfaces as this error, whatever the server sent. */
export class ApiError extends Error {
  readonly status: number;
  readonly problem: ProblemDetails;
  /** The response body as received, for callers that expect a non-problem error body. */
  readonly body: unknown;

  constructor(problem: ProblemDetails, body: unknown = undefined) {
    super(problem.detail ? `${problem.title}: ${problem.detail}` : problem.title);
    this.name = 'ApiError';
    this.status = problem.status;
    this.problem = problem;
    this.body = body;
  }

  /** The message for one input, by its JSON Pointer (`/inputs/0/min`), to show beside that field. */
  messageFor(pointer: string): string | undefined {
    return this.problem.errors.find((e) => e.path === pointer)?.message;
  }
}

/** Turn any error response into problem details; a body that is not one is described honestly. */
export function toProblemDetails(status: number, statusText: string, body: unknown): ProblemDetails {
  const parsed = problemSchema.safeParse(body);
  if (parsed.success) return { ...parsed.data, errors: parsed.data.errors ?? [] };
  return {
    type: 'about:blank',
    title: statusText || `HTTP ${status}`,
    status,
    detail: 'The server answered without problem details.',
    errors: [],
  };
}

interface RequestOptions<T> {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** When given, the response body is validated; a mismatch is reported, not passed on. */
  schema?: z.ZodType<T>;
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  const type = response.headers.get('content-type') ?? '';
  if (type.includes('application/json') || type.includes(PROBLEM_CONTENT_TYPE)) {
    try {
      return JSON.parse(text);
    } catch {
      return text;
    }
  }
  return text;
}

export async function apiRequest<T>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = 'GET', body, signal, schema } = options;
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      signal,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json, application/problem+json',
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiError({
      type: 'about:blank',
      title: 'Network error',
      status: 0,
      detail: 'The Pinwork server could not be reached.',
      errors: [],
    });
  }

  const data = await readBody(response);
  if (!response.ok) throw new ApiError(toProblemDetails(response.status, response.statusText, data), data);
  if (!schema) return data as T;

  const parsed = schema.safeParse(data);
  if (!parsed.success) {
    throw new ApiError({
      type: 'about:blank',
      title: 'Unexpected response',
      status: response.status,
      detail: `The server's answer to ${method} ${path} does not have the expected shape.`,
      errors: fieldErrorsFromZodIssues(parsed.error.issues),
    });
  }
  return parsed.data;
}
