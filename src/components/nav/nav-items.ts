import { can, type Role } from '@/shared/roles';

export type NavKey = 'due' | 'vehicles' | 'team' | 'mail' | 'settings' | 'account';
export type NavItem = {
  key: NavKey;
  label: string;
  href: '/due' | '/vehicles' | '/members' | '/outbox' | '/settings' | '/account';
};

// "Due" comes first: on a phone it is where a technician starts the day.
const ALL: NavItem[] = [
  { key: 'due', label: 'Due', href: '/due' },
  { key: 'vehicles', label: 'Vehicles', href: '/vehicles' },
  { key: 'team', label: 'Team', href: '/members' },
  { key: 'mail', label: 'Mail', href: '/outbox' },
  { key: 'settings', label: 'Settings', href: '/settings' },
  { key: 'account', label: 'Account', href: '/account' },
];

/**
 * The entries this role can use; "Mail" only while the development outbox answers. Hiding is
 * a courtesy: the server refuses the same actions anyway.
 */
export function navItemsFor(role: Role, outboxAvailable: boolean): NavItem[] {
  return ALL.filter((item) => {
    if (item.key === 'due') return can(role, 'rechecks.write');
    if (item.key === 'vehicles') return can(role, 'vehicles.read');
    if (item.key === 'team') return can(role, 'members.read');
    if (item.key === 'mail') return outboxAvailable;
    // The workshop's team reads the rates and thresholds behind the estimates (only the owner
    // edits them); a client has no use for the shop's labour rate and timber prices.
    if (item.key === 'settings') return can(role, 'members.read');
    return true;
  });
}

/** Which entry a path belongs to ('/' is the vehicles list). */
export function activeNavKey(pathname: string): NavKey | null {
  if (pathname.startsWith('/due')) return 'due';
  if (pathname === '/' || pathname.startsWith('/vehicles')) return 'vehicles';
  if (pathname.startsWith('/members')) return 'team';
  if (pathname.startsWith('/outbox')) return 'mail';
  if (pathname.startsWith('/settings')) return 'settings';
  if (pathname.startsWith('/account')) return 'account';
  return null;
}
