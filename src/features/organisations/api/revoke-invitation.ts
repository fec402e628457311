import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { membersQueryKey } from './get-members';

export async function revokeInvitation(organisationId: string, invitationId: string): Promise<void> {
  await apiRequest(`/api/organisations/${encodeURIComponent(organisationId)}/invitations/${encodeURIComponent(invitationId)}`, { method: 'DELETE' });
}

export function useRevokeInvitation(organisationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation(organisationId, invitationId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(organisationId) }),
  });
}
