import type { IconName } from '@/components/ui/Icon';
import type { ServerInfo, Session } from '@/lib/api/types';
import { can } from '@/lib/roles';

export interface NavItem {
  href:
    | '/'
    | '/recipes'
    | '/batches'
    | '/quick-check'
    | '/ingredients'
    | '/bottles'
    | '/team'
    | '/outbox'
    | '/profile'
    | '/more';
  label: string;
  /** The word under the icon in the phone tab bar, where six labels share 390 px. */
  shortLabel: string;
  icon: IconName;
}

/** The destinations a person sees, by role. A destination appears only once it does something. */
export function navItemsFor(session: Session, serverInfo: ServerInfo | undefined): NavItem[] {
  const role = session.user.role;
  const items: NavItem[] = [
    { href: '/', label: 'Home', shortLabel: 'Home', icon: 'home' },
    { href: '/recipes', label: 'Recipes', shortLabel: 'Recipes', icon: 'flask' },
    ...(can(role, 'batches.read')
      ? [{ href: '/batches' as const, label: 'Batches', shortLabel: 'Batches', icon: 'batch' as const }]
      : []),
    { href: '/quick-check', label: 'Quick check', shortLabel: 'Check', icon: 'gauge' },
    { href: '/ingredients', label: 'Ingredients', shortLabel: 'Ingredients', icon: 'leaf' },
    { href: '/bottles', label: 'Bottles', shortLabel: 'Bottles', icon: 'bottle' },
  ];
  if (can(role, 'team.manage')) items.push({ href: '/team', label: 'Team', shortLabel: 'Team', icon: 'team' });
  if (serverInfo?.outbox && (can(role, 'outbox.brewery') || serverInfo.outboxOpen))
    items.push({ href: '/outbox', label: 'Mail outbox', shortLabel: 'Outbox', icon: 'mail' });
  items.push({ href: '/profile', label: 'Profile', shortLabel: 'Profile', icon: 'person' });
  return items;
}

/** Whether a nav item is the current page (Home only on its own path). */
export function isActive(item: NavItem, pathname: string): boolean {
  return item.href === '/' ? pathname === '/' : pathname === item.href || pathname.startsWith(`${item.href}/`);
}

/** Most tabs a phone's bottom bar holds at 390 px before labels get cramped. */
export const PHONE_TAB_LIMIT = 5;

/** The phone tab bar: every destination when they fit, else the first four and "More", which lists the rest. */
export function phoneTabs(items: NavItem[]): { tabs: NavItem[]; overflow: NavItem[] } {
  if (items.length <= PHONE_TAB_LIMIT) return { tabs: items, overflow: [] };
  const tabs = items.slice(0, PHONE_TAB_LIMIT - 1);
  return {
    tabs: [...tabs, { href: '/more', label: 'More', shortLabel: 'More', icon: 'more' }],
    overflow: items.slice(PHONE_TAB_LIMIT - 1),
  };
}
