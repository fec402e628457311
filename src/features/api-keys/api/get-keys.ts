import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiKeyListSchema, type ApiKeyInfo } from '../../../../shared/api/v1';
import { apiRequest } from '../../../lib/api-client';
import { keysQueryKey, ownerBase, type KeyOwner } from './key-owner';

export type { ApiKeyInfo };
export interface KeyList {
  items: ApiKeyInfo[];
  organisationNames?: Record<string, string> | undefined;
}

export function getKeys(owner: KeyOwner, signal?: AbortSignal): Promise<KeyList> {
  return apiRequest(`${ownerBase(owner)}/api-keys`, { schema: apiKeyListSchema, signal });
}

export function keysQueryOptions(owner: KeyOwner) {
  return queryOptions({ queryKey: keysQueryKey(owner), queryFn: ({ signal }) => getKeys(owner, signal) });
}

export function useKeys(owner: KeyOwner) {
  return useQuery(keysQueryOptions(owner));
}
