import { compileTemplate } from '../mechanics/compile-template';
import { SpecError, type SpecIssue } from '../mechanics/errors';
import { templateSpecSchema, type TemplateSpec } from './template-spec';

export type SpecValidation = { ok: true; spec: TemplateSpec } | { ok: false; issues: SpecIssue[] };

/**
 * Every problem of a spec, each with its path: first its shape (zod), then what needs the whole
 * spec (unknown points, parts and quantities, cycles, expressions that cannot compile).
 */
export function validateSpec(input: unknown): SpecValidation {
  const parsed = templateSpecSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      issues: parsed.error.issues.map((i) => ({ path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)), message: i.message })),
    };
  }
  try {
    compileTemplate(parsed.data);
  } catch (err) {
    if (err instanceof SpecError) return { ok: false, issues: err.issues };
    throw err;
  }
  return { ok: true, spec: parsed.data };
}
