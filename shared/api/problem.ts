import { z } from 'zod';

// RFC 9457 problem details: the one error shape of the Pinwork API. The server builds these;
// the client parses them and puts each `errors[i].message` beside the field its path names.

/** A field's location as an RFC 6901 JSON Pointer into the request body, e.g. `/inputs/0/min`. */
export const problemFieldErrorSchema = z.object({
  path: z.string(),
  message: z.string(),
});
export type ProblemFieldError = z.infer<typeof problemFieldErrorSchema>;

// Loose: RFC 9457 lets a problem type add members of its own, and a client must keep them.
export const problemSchema = z.looseObject({
  type: z.string(),
  title: z.string(),
  status: z.number().int().min(400).max(599),
  detail: z.string().optional(),
  instance: z.string().optional(),
  errors: z.array(problemFieldErrorSchema).optional(),
});
export type Problem = z.infer<typeof problemSchema>;

export const PROBLEM_CONTENT_TYPE = 'application/problem+json';

/** Problem type URIs (relative references; a later issue may serve a page at each). */
export const problemTypes = {
  validation: '/problems/validation',
  malformedJson: '/problems/malformed-json',
  payloadTooLarge: '/problems/payload-too-large',
  unsupportedMediaType: '/problems/unsupported-media-type',
  notFound: '/problems/not-found',
  methodNotAllowed: '/problems/method-not-allowed',
  notAcceptable: '/problems/not-acceptable',
  conflict: '/problems/conflict',
  unavailable: '/problems/unavailable',
  internal: '/problems/internal',
  /** RFC 9457's own "no further meaning than the status code". */
  generic: 'about:blank',
} as const;

export function toJsonPointer(path: readonly PropertyKey[]): string {
  return path.map((segment) => `/${String(segment).replaceAll('~', '~0').replaceAll('/', '~1')}`).join('');
}

/** zod issues → `errors` entries; the root of the body is the empty pointer `""`. */
export function fieldErrorsFromZodIssues(issues: readonly z.core.$ZodIssue[]): ProblemFieldError[] {
  return issues.map((issue) => ({ path: toJsonPointer(issue.path), message: issue.message }));
}

export function validationProblem(
  issues: readonly z.core.$ZodIssue[],
  detail = 'The request has fields that are missing or not valid; see errors.',
): Problem {
  return {
    type: problemTypes.validation,
    title: 'Validation failed',
    status: 422,
    detail,
    errors: fieldErrorsFromZodIssues(issues),
  };
}
