import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createdApiKeySchema, type CreatedApiKey } from '../../../../shared/api/v1';
import { apiRequest } from '../../../lib/api-client';
import { keysQueryKey, ownerBase, type KeyOwner } from './key-owner';

export function rotateKey(owner: KeyOwner, keyId: string, graceSeconds: number): Promise<CreatedApiKey> {
  return apiRequest(`${ownerBase(owner)}/api-keys/${encodeURIComponent(keyId)}/rotate`, { method: 'POST', body: { graceSeconds }, schema: createdApiKeySchema });
}

export function useRotateKey(owner: KeyOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ keyId, graceSeconds }: { keyId: string; graceSeconds: number }) => rotateKey(owner, keyId, graceSeconds),
    onSettled: () => queryClient.invalidateQueries({ queryKey: keysQueryKey(owner) }),
  });
}
