import { z } from 'zod';
import { quantitySchema } from '../units/quantities';

/**
 * Request and output shapes of the sensitivity views, apart from the code that computes them,
 * so the API contract (and the client bundle) need not pull in the engine.
 */
export const MAX_SWEEP_STEPS = 1000;

export const sweepRequestSchema = z.object({
  input: z.string().min(1).describe('The input to vary'),
  from: z.number().optional().describe("Start value (default: the input's minimum)"),
  to: z.number().optional().describe("End value (default: the input's maximum)"),
  steps: z.number().int().min(2).max(MAX_SWEEP_STEPS).default(50).describe('Number of values, ends included'),
  results: z.array(z.string().min(1)).max(20).optional().describe('Result keys to return (default: all)'),
});
export type SweepRequest = z.input<typeof sweepRequestSchema>;

const seriesSchema = z.object({ key: z.string(), label: z.string(), quantity: quantitySchema });

export const sweepOutputSchema = z.object({
  input: z.object({ key: z.string(), label: z.string(), quantity: quantitySchema }),
  series: z.array(seriesSchema),
  steps: z.array(
    z.union([
      z.object({ value: z.number(), ok: z.literal(true), values: z.record(z.string(), z.number().nullable()) }),
      z.object({ value: z.number(), ok: z.literal(false), error: z.object({ kind: z.string(), message: z.string() }) }),
    ]),
  ),
});
export type SweepOutput = z.infer<typeof sweepOutputSchema>;

export const tornadoRequestSchema = z.object({
  result: z.string().min(1).describe('The result whose sensitivity is ranked'),
  percent: z.number().gt(0).max(50).default(10).describe('Each input is moved by ± this percentage'),
  inputs: z.array(z.string().min(1)).max(60).optional().describe('Inputs to rank (default: all but choices)'),
});
export type TornadoRequest = z.input<typeof tornadoRequestSchema>;

const sideSchema = z.object({ input: z.number(), value: z.number().nullable(), note: z.string().optional() });
export const tornadoOutputSchema = z.object({
  result: seriesSchema,
  base: z.number(),
  percent: z.number(),
  bars: z.array(
    z.object({
      input: z.string(),
      label: z.string(),
      quantity: quantitySchema,
      low: sideSchema,
      high: sideSchema,
      /** |high − low| where both exist, else the one-sided change; the ranking key. */
      swing: z.number(),
      /** (∂R/∂x)(x/R) at the operating point; null where R or x is zero or a side fails. */
      elasticity: z.number().nullable(),
    }),
  ),
});
export type TornadoOutput = z.infer<typeof tornadoOutputSchema>;

