import type { ServerInfo, Session } from '@/lib/api/types';
import { canManageTeam } from '@/lib/roles';

import type { IconName } from '../ui/Icon';

export interface NavItem {
  href: '/' | '/quick-check' | '/bottles' | '/team' | '/outbox' | '/profile';
  label: string;
  /** The word under the icon in the phone tab bar, where six labels share 390 px. */
  shortLabel: string;
  icon: IconName;
}

/** The destinations a person sees, by role. A destination appears only once it does something. */
export function navItemsFor(session: Session, serverInfo: ServerInfo | undefined): NavItem[] {
  const owner = canManageTeam(session.user.role);
  const items: NavItem[] = [
    { href: '/', label: 'Home', shortLabel: 'Home', icon: 'home' },
    { href: '/quick-check', label: 'Quick check', shortLabel: 'Check', icon: 'gauge' },
    { href: '/bottles', label: 'Bottles', shortLabel: 'Bottles', icon: 'bottle' },
  ];
  if (owner) items.push({ href: '/team', label: 'Team', shortLabel: 'Team', icon: 'team' });
  if (serverInfo?.outbox && (owner || serverInfo.outboxOpen)) items.push({ href: '/outbox', label: 'Mail outbox', shortLabel: 'Outbox', icon: 'mail' });
  items.push({ href: '/profile', label: 'Profile', shortLabel: 'Profile', icon: 'person' });
  return items;
}

/** Whether a nav item is the current page (Home only on its own path). */
export function isActive(item: NavItem, pathname: string): boolean {
  return item.href === '/' ? pathname === '/' : pathname === item.href || pathname.startsWith(`${item.href}/`);
}
