import { userRoles, type UserRole } from '../../../../shared/api/auth';

// The admin area names roles the way the rest of the app does; kept here because features do not share modules.
export const roleNames: Record<UserRole, string> = {
  admin: 'Administrator',
  engineer: 'Engineer',
  supplier: 'Supplier',
  user: 'Member',
};

export const roleOptions = userRoles.map((role) => ({ value: role, label: roleNames[role] }));
