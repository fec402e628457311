import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationPreviewSchema, type InvitationPreview } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function previewInvitation(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return apiRequest(`/api/invitations/preview?token=${encodeURIComponent(token)}`, { schema: invitationPreviewSchema, signal });
}

export function invitationPreviewQueryOptions(token: string) {
  return queryOptions({ queryKey: ['invitations', 'preview', token], queryFn: ({ signal }) => previewInvitation(token, signal), retry: false });
}

export function useInvitationPreview(token: string) {
  return useQuery({ ...invitationPreviewQueryOptions(token), enabled: token.length > 0 });
}
