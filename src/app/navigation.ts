import type { Role } from '@shared/schemas/auth';
import { adminRoles, contributorRoles, editorRoles } from '@/lib/roles';

/** Who sees a navigation entry. The server still enforces access; this only tidies the menu. */
export type NavAudience = 'everyone' | 'signed-in' | readonly Role[];

export interface NavItem {
  to: string;
  /** Short label shown in the bar. */
  label: string;
  /** Full name, given to assistive technology and as a tooltip when the label is shortened. */
  title?: string;
  audience: NavAudience;
}

/**
 * The main navigation, in display order. To add a section: add its route in
 * router.tsx and an entry here with the audience that may open it.
 */
export const mainNav: readonly NavItem[] = [
  { to: '/search', label: 'Search', audience: 'everyone' },
  { to: '/sources', label: 'Sources', audience: 'everyone' },
  { to: '/concordance', label: 'Concordance', audience: 'everyone' },
  { to: '/reckoner', label: 'Reckoner', title: 'Pitch & size reckoner', audience: 'everyone' },
  { to: '/programmes', label: 'Programmes', audience: 'signed-in' },
  { to: '/contribute', label: 'Contribute', audience: contributorRoles },
  { to: '/submissions', label: 'My submissions', audience: contributorRoles },
  { to: '/review', label: 'Review', audience: editorRoles },
  { to: '/admin', label: 'Admin', audience: adminRoles },
];

export function canSee(audience: NavAudience, role: Role | null): boolean {
  if (audience === 'everyone') return true;
  if (role === null) return false;
  if (audience === 'signed-in') return true;
  return audience.includes(role);
}

export function visibleNav(role: Role | null, items: readonly NavItem[] = mainNav): NavItem[] {
  return items.filter((item) => canSee(item.audience, role));
}
