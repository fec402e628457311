import type { MeResponse } from '../../shared/api/auth';
import type { NavItem } from '../components/app-shell';

/**
 * Menu items by what the signed-in person may do. Only a convenience: the server refuses
 * every request the role may not make, whatever the menu shows.
 */
export function roleNavItems(me: MeResponse | null | undefined): NavItem[] {
  if (!me) return [];
  const items: NavItem[] = [];
  if (me.user.role === 'supplier' || me.organisations.length > 0) items.push({ to: '/organisation', label: 'My organisation' });
  if (me.capabilities.includes('admin')) items.push({ to: '/admin', label: 'Admin' });
  return items;
}

export function canSeeOrganisation(me: MeResponse): boolean {
  return me.user.role === 'supplier' || me.user.role === 'admin' || me.organisations.length > 0;
}
