import { queryOptions, useQuery } from '@tanstack/react-query';
import { demoApiKeySchema, type DemoApiKey } from '../../../../shared/api/demo-key';
import { ApiError, apiRequest } from '../../../lib/api-client';

/** The development server's demo key; null where there is none (production answers 404). */
export async function getDemoKey(signal?: AbortSignal): Promise<DemoApiKey | null> {
  try {
    return await apiRequest('/api/dev/demo-key', { schema: demoApiKeySchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  }
}

export function demoKeyQueryOptions() {
  return queryOptions({
    queryKey: ['dev', 'demo-key'],
    queryFn: ({ signal }) => getDemoKey(signal),
    staleTime: Infinity,
    retry: false,
  });
}

/** Asked only when `enabled`: on a server that says it runs in development. */
export function useDemoKey(enabled: boolean) {
  return useQuery({ ...demoKeyQueryOptions(), enabled });
}
