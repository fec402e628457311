import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { membersQueryKey } from './get-members';

export async function removeMember(organisationId: string, userId: string): Promise<void> {
  await apiRequest(`/api/organisations/${encodeURIComponent(organisationId)}/members/${encodeURIComponent(userId)}`, { method: 'DELETE' });
}

export function useRemoveMember(organisationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(organisationId, userId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(organisationId) }),
  });
}
