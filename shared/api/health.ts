import { z } from 'zod';

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  /** How the server runs: development offers demo accounts, a demo API key and the mail outbox. */
  mode: z.enum(['development', 'production', 'test']),
  database: z.object({
    ok: z.boolean(),
    driver: z.enum(['pglite', 'postgres']),
    latencyMs: z.number().nonnegative().nullable(),
  }),
});
export type Health = z.infer<typeof healthSchema>;
