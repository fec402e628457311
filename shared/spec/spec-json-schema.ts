import { z } from 'zod';
import { templateSpecSchema } from './template-spec';

/** Draft-07 JSON Schema of a whole template spec, published for authors and their tools. */
export function specJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(templateSpecSchema, { target: 'draft-7', io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
}
