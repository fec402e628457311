import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserSchema, type AdminUser } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { usersQueryKeyRoot } from './get-users';

export function enableUser(userId: string): Promise<AdminUser> {
  return apiRequest(`/api/admin/users/${encodeURIComponent(userId)}/enable`, { method: 'POST', body: {}, schema: adminUserSchema });
}

export function useEnableUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: enableUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKeyRoot }),
  });
}
