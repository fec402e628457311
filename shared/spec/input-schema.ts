import { z } from 'zod';
import { unitOf } from '../units/unit-systems';
import type { InputDef, TemplateSpec } from './template-spec';

/**
 * The zod schema of one template's inputs, built from its spec: the same object validates an
 * API request, types the form, and gives the JSON Schema the calculator form and the API docs
 * render. Values are in the engine's units (mm, N, kg, degrees).
 */
export function inputZodSchema(spec: Pick<TemplateSpec, 'inputs'>) {
  const shape: Record<string, z.ZodType> = {};
  for (const inp of spec.inputs) shape[inp.key] = inputField(inp);
  return z.object(shape).strict();
}

function inputField(inp: InputDef) {
  const unit = unitOf(inp.quantity, 'SI');
  const description = [inp.help, unit ? `In ${unit}.` : ''].filter(Boolean).join(' ');
  // zod 4 numbers refuse NaN and ±Infinity themselves; keep the bounds on the number itself
  // (not behind a pipe) so that they reach the JSON Schema.
  const base = z
    .number({ error: (iss) => (iss.input === undefined ? 'is required' : 'must be a finite number') })
    .min(inp.min, `must be at least ${inp.min}${unit ? ` ${unit}` : ''}`)
    .max(inp.max, `must be at most ${inp.max}${unit ? ` ${unit}` : ''}`);
  const field = inp.control === 'choice' && inp.choices
    ? z.union(inp.choices.map((c) => z.literal(c.value).describe(c.label)) as unknown as [z.ZodLiteral<number>, z.ZodLiteral<number>])
    : base;
  return field.default(inp.default).meta({ title: inp.label, description, quantity: inp.quantity, unit });
}

/** Draft-07 JSON Schema of a template's inputs (what RJSF and the OpenAPI document use). */
export function inputJsonSchema(spec: Pick<TemplateSpec, 'inputs'>): Record<string, unknown> {
  return z.toJSONSchema(inputZodSchema(spec), { target: 'draft-7', io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
}
