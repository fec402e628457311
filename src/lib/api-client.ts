import type { z } from './zod';

/** One failing input, as the API names it: a path into the request and a reason. */
export interface FieldProblem {
  path: string;
  message: string;
}

/** RFC 9457 problem details, with the extension members Pinwork's API uses. */
export interface ProblemDetails {
  type: string;
  title: string;
  status: number;
  detail?: string;
  instance?: string;
  errors: FieldProblem[];
  [extension: string]: unknown;
}

/** Every failed API call surfaces as this error, whatever the server sent. */
export class ApiError extends Error {
  readonly status: number;
  readonly problem: ProblemDetails;

  constructor(problem: ProblemDetails) {
    super(problem.detail ? `${problem.title}: ${problem.detail}` : problem.title);
    this.name = 'ApiError';
    this.status = problem.status;
    this.problem = problem;
  }

  /** The message for one input, so a form can show it beside that field. */
  messageFor(path: string): string | undefined {
    return this.problem.errors.find((e) => e.path === path)?.message;
  }
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function pathToString(path: unknown): string {
  if (Array.isArray(path)) return path.map(String).join('.');
  if (typeof path === 'string') return path.replace(/^\//, '').replaceAll('/', '.');
  return '';
}

function readFieldProblems(body: Record<string, unknown>): FieldProblem[] {
  const list = body.errors ?? body.issues ?? body['invalid-params'] ?? body.invalidParams;
  if (!Array.isArray(list)) return [];
  return list.filter(isRecord).map((item) => ({
    path: pathToString(item.path ?? item.pointer ?? item.name ?? item.field),
    message: String(item.message ?? item.reason ?? item.detail ?? 'is not valid'),
  }));
}

/** Turn any error response into problem details; a body that is not one is described honestly. */
export function toProblemDetails(status: number, statusText: string, body: unknown): ProblemDetails {
  if (isRecord(body) && typeof body.title === 'string') {
    return {
      ...body,
      type: typeof body.type === 'string' ? body.type : 'about:blank',
      title: body.title,
      status: typeof body.status === 'number' ? body.status : status,
      detail: typeof body.detail === 'string' ? body.detail : undefined,
      instance: typeof body.instance === 'string' ? body.instance : undefined,
      errors: readFieldProblems(body),
    };
  }
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
  if (type.includes('json')) {
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
  if (!response.ok) throw new ApiError(toProblemDetails(response.status, response.statusText, data));
  if (!schema) return data as T;

  const parsed = schema.safeParse(data);
  if (!parsed.success) {
    throw new ApiError({
      type: 'about:blank',
      title: 'Unexpected response',
      status: response.status,
      detail: `The server's answer to ${method} ${path} does not have the expected shape.`,
      errors: parsed.error.issues.map((issue) => ({
        path: issue.path.map(String).join('.'),
        message: issue.message,
      })),
    });
  }
  return parsed.data;
}
