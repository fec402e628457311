import { ApiError } from './api-client';

export interface FormErrors {
  /** Messages by top-level body field (`/email` → `email`), first one per field. */
  fields: Record<string, string>;
  /** What to show above the form: the problem's own words, or a plain fallback. */
  summary?: string;
}

/** Spreads a failed request over a form: field messages beside fields, the rest on top. */
export function formErrorsFrom(error: unknown, fallback = 'The request did not go through. Try again in a moment.'): FormErrors {
  if (!error) return { fields: {} };
  if (!(error instanceof ApiError)) return { fields: {}, summary: fallback };
  const fields: Record<string, string> = {};
  for (const e of error.problem.errors) {
    const key = e.path.replace(/^\//, '').split('/')[0] ?? '';
    if (key && !(key in fields)) fields[key] = e.message;
  }
  const p = error.problem;
  const summary = p.status === 0 ? (p.detail ?? fallback) : (p.detail ?? p.title);
  return { fields, summary };
}

/** Messages by top-level field from a failed zod parse (the form's own check before sending). */
export function fieldErrorsFromIssues(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    const key = String(issue.path[0] ?? '');
    if (key && !(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

/** "must be at least 10 characters" beside "Password" reads as "Password must be at least 10 characters". */
export function withFieldName(label: string, message: string | undefined): string | undefined {
  if (!message) return undefined;
  return /^(must|is|has|was|should|cannot|can't|does)\b/.test(message) ? `${label} ${message}.`.replace(/\.\.$/, '.') : message;
}
