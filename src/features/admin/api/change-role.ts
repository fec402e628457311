import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserSchema, type AdminUser, type UserRole } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { usersQueryKeyRoot } from './get-users';

export function changeRole(userId: string, role: UserRole): Promise<AdminUser> {
  return apiRequest(`/api/admin/users/${encodeURIComponent(userId)}/role`, { method: 'PATCH', body: { role }, schema: adminUserSchema });
}

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: UserRole }) => changeRole(userId, role),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKeyRoot }),
  });
}
