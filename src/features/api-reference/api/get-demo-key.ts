import { queryOptions, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { healthQueryOptions } from '../../health/api/get-health';
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

export function demoKeyQueryOptions(queryClient: QueryClient) {
  return queryOptions({
    queryKey: ['dev', 'demo-key'],
    // Only a development server has the key: ask it how it runs first, so a production page
    // makes no request that must fail.
    queryFn: async ({ signal }) => ((await queryClient.fetchQuery(healthQueryOptions())).mode === 'development' ? getDemoKey(signal) : null),
    staleTime: Infinity,
    retry: false,
  });
}

export function useDemoKey() {
  return useQuery(demoKeyQueryOptions(useQueryClient()));
}
