import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationSchema, type CreateInvitationRequest, type Invitation } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { membersQueryKey } from './get-members';

export function createInvitation(organisationId: string, body: CreateInvitationRequest): Promise<Invitation> {
  return apiRequest(`/api/organisations/${encodeURIComponent(organisationId)}/invitations`, { method: 'POST', body, schema: invitationSchema });
}

export function useCreateInvitation(organisationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) => createInvitation(organisationId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(organisationId) }),
  });
}
