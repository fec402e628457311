import { queryOptions, useQuery } from '@tanstack/react-query';
import { memberListSchema, type MemberList } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export type { MemberList };

export function getMembers(organisationId: string, signal?: AbortSignal): Promise<MemberList> {
  return apiRequest(`/api/organisations/${encodeURIComponent(organisationId)}/members`, { schema: memberListSchema, signal });
}

export const membersQueryKey = (organisationId: string) => ['organisations', organisationId, 'members'] as const;

export function membersQueryOptions(organisationId: string) {
  return queryOptions({ queryKey: membersQueryKey(organisationId), queryFn: ({ signal }) => getMembers(organisationId, signal) });
}

export function useMembers(organisationId: string) {
  return useQuery(membersQueryOptions(organisationId));
}
