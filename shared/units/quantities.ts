import { z } from 'zod';

/**
 * Every number Pinwork computes carries one of these quantities. The engine works in one
 * internal system (N, mm, kg, N·mm, MPa, degrees); views convert at the edge through
 * the table in ./unit-systems.ts.
 */
export const quantitySchema = z.enum([
  'length',
  'force',
  'mass',
  'angle',
  'moment',
  'stress',
  'ratio',
  'coefficient',
  'percent',
  'count',
]);
export type Quantity = z.infer<typeof quantitySchema>;
