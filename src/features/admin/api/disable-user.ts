import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserSchema, type AdminUser } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { usersQueryKeyRoot } from './get-users';

export function disableUser(userId: string, reason?: string): Promise<AdminUser> {
  return apiRequest(`/api/admin/users/${encodeURIComponent(userId)}/disable`, {
    method: 'POST',
    body: reason ? { reason } : {},
    schema: adminUserSchema,
  });
}

export function useDisableUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, reason }: { userId: string; reason?: string }) => disableUser(userId, reason),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKeyRoot }),
  });
}
