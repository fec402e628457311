import { queryOptions, useQuery } from '@tanstack/react-query';
import { sessionListSchema, type SessionList } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function getSessions(signal?: AbortSignal): Promise<SessionList> {
  return apiRequest('/api/me/sessions', { schema: sessionListSchema, signal });
}

export const sessionsQueryKey = ['account', 'sessions'] as const;

export function sessionsQueryOptions() {
  return queryOptions({ queryKey: sessionsQueryKey, queryFn: ({ signal }) => getSessions(signal), staleTime: 10_000 });
}

export function useSessions() {
  return useQuery(sessionsQueryOptions());
}
