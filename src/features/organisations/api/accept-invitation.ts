import { useMutation } from '@tanstack/react-query';
import { acceptInvitationResponseSchema, type MyOrganisation, type UserRole } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function acceptInvitation(token: string): Promise<{ organisation: MyOrganisation; userRole: UserRole }> {
  return apiRequest('/api/invitations/accept', { method: 'POST', body: { token }, schema: acceptInvitationResponseSchema });
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: acceptInvitation });
}
