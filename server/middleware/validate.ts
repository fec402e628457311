import type { z } from 'zod';
import { validationProblem } from '../../shared/api/problem';
import { HttpProblem } from './http-problem';

/** Parses a request part with a zod schema, or throws a 422 problem naming every bad field. */
export function parseOrThrow<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw new HttpProblem(validationProblem(result.error.issues));
  return result.data;
}
