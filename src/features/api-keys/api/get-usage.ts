import { queryOptions, useQuery } from '@tanstack/react-query';
import { usageReportSchema, type UsageReport } from '../../../../shared/api/v1';
import { apiRequest } from '../../../lib/api-client';
import { ownerBase, usageQueryKey, type KeyOwner } from './key-owner';

export type { UsageReport };

/** The last 30 days (the server's default range) of calls per key, endpoint and day. */
export function getUsage(owner: KeyOwner, signal?: AbortSignal): Promise<UsageReport> {
  return apiRequest(`${ownerBase(owner)}/api-usage`, { schema: usageReportSchema, signal });
}

export function usageQueryOptions(owner: KeyOwner) {
  return queryOptions({ queryKey: usageQueryKey(owner), queryFn: ({ signal }) => getUsage(owner, signal) });
}

export function useUsage(owner: KeyOwner) {
  return useQuery(usageQueryOptions(owner));
}
