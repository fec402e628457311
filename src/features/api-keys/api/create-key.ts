import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createdApiKeySchema, type CreateApiKeyRequest, type CreatedApiKey } from '../../../../shared/api/v1';
import { apiRequest } from '../../../lib/api-client';
import { keysQueryKey, ownerBase, type KeyOwner } from './key-owner';

export type { CreatedApiKey };

export function createKey(owner: KeyOwner, body: CreateApiKeyRequest): Promise<CreatedApiKey> {
  return apiRequest(`${ownerBase(owner)}/api-keys`, { method: 'POST', body, schema: createdApiKeySchema });
}

export function useCreateKey(owner: KeyOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateApiKeyRequest) => createKey(owner, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: keysQueryKey(owner) }),
  });
}
