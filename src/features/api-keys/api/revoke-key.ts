import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiKeyInfoSchema, type ApiKeyInfo } from '../../../../shared/api/v1';
import { apiRequest } from '../../../lib/api-client';
import { keysQueryKey, ownerBase, type KeyOwner } from './key-owner';

export function revokeKey(owner: KeyOwner, keyId: string): Promise<ApiKeyInfo> {
  return apiRequest(`${ownerBase(owner)}/api-keys/${encodeURIComponent(keyId)}/revoke`, { method: 'POST', body: {}, schema: apiKeyInfoSchema });
}

export function useRevokeKey(owner: KeyOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (keyId: string) => revokeKey(owner, keyId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: keysQueryKey(owner) }),
  });
}
