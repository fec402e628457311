import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from '../../../lib/zod';
import { apiRequest } from '../../../lib/api-client';

// The server reports the database either as a plain word or as an object with a
// status; both are accepted so the home page reads either shape.
const databaseState = z.union([
  z.string(),
  z.looseObject({ status: z.string(), kind: z.string().optional(), driver: z.string().optional() }),
]);

export const healthSchema = z.looseObject({
  status: z.string(),
  version: z.string().optional(),
  database: databaseState.optional(),
});

export type Health = z.infer<typeof healthSchema>;

export function getHealth(signal?: AbortSignal): Promise<Health> {
  return apiRequest('/api/health', { schema: healthSchema, signal });
}

export function healthQueryOptions() {
  return queryOptions({
    queryKey: ['health'],
    queryFn: ({ signal }) => getHealth(signal),
    staleTime: 10_000,
  });
}

export function useHealth() {
  return useQuery(healthQueryOptions());
}

export function databaseStatus(health: Health): string | undefined {
  const db = health.database;
  if (db === undefined) return undefined;
  return typeof db === 'string' ? db : db.status;
}

export function databaseKind(health: Health): string | undefined {
  const db = health.database;
  if (db === undefined || typeof db === 'string') return undefined;
  return db.kind ?? db.driver;
}
