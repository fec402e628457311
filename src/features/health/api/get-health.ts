import { queryOptions, useQuery } from '@tanstack/react-query';
import { healthSchema, type Health } from '../../../../shared/api/health';
import { ApiError, apiRequest } from '../../../lib/api-client';

export type { Health };

/**
 * The server's health. A 503 whose body is a health report (the database not answering)
 * is an answer, not a failure: it is returned so the page can say what is degraded.
 */
export async function getHealth(signal?: AbortSignal): Promise<Health> {
  try {
    return await apiRequest('/api/health', { schema: healthSchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 503) {
      const report = healthSchema.safeParse(error.body);
      if (report.success) return report.data;
    }
    throw error;
  }
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
