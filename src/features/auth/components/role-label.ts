import type { UserRole } from '../../../../shared/api/auth';

export const roleLabels: Record<UserRole, string> = {
  admin: 'Administrator',
  engineer: 'Engineer',
  supplier: 'Supplier',
  user: 'Member',
};
