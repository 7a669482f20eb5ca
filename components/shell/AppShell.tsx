import { usePathname, useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View, type ViewStyle } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { Icon } from '@/components/ui/Icon';
import { Logo } from '@/components/ui/Logo';
import { Text } from '@/components/ui/Text';
import { useServerInfoQuery, useSignOutMutation } from '@/lib/api/session';
import type { Session } from '@/lib/api/types';
import { ROLE_LABELS } from '@/lib/roles';
import { breakpoints, colors, fonts, fontSize, radius, space, touchTarget } from '@/lib/theme';

import { isActive, type NavItem, navItemsFor, phoneTabs } from './nav';

interface Props {
  session: Session;
  children: ReactNode;
}

/** The signed-in frame: a side rail on wide windows, a header and bottom tab bar on phones. */
export function AppShell({ session, children }: Props) {
  const { width } = useWindowDimensions();
  const { data: serverInfo } = useServerInfoQuery();
  const items = navItemsFor(session, serverInfo);
  return width >= breakpoints.wide ? (
    <SideRail session={session} items={items}>
      {children}
    </SideRail>
  ) : (
    <PhoneFrame session={session} items={items}>
      {children}
    </PhoneFrame>
  );
}

function useNavigate() {
  const router = useRouter();
  return (item: NavItem) => router.navigate(item.href);
}

function SideRail({ session, items, children }: Props & { items: NavItem[] }) {
  const pathname = usePathname();
  const navigate = useNavigate();
  const signOut = useSignOutMutation();
  return (
    <View style={styles.wideRoot}>
      <View role="navigation" aria-label="Main" style={styles.rail}>
        <View style={styles.railBrand}>
          <Logo inverse size={30} />
          <Text style={styles.railBrewery}>{session.organisation.name}</Text>
        </View>
        <View style={styles.railItems}>
          {items.map((item) => {
            const active = isActive(item, pathname);
            return (
              <Pressable
                key={item.href}
                role="link"
                aria-current={active ? 'page' : undefined}
                aria-label={item.label}
                onPress={() => navigate(item)}
                style={(state) => [styles.railItem, active && styles.railItemActive, focusRing(state)]}
              >
                <Icon name={item.icon} color={colors.railText} />
                <Text style={styles.railLabel}>{item.label}</Text>
              </Pressable>
            );
          })}
        </View>
        <View style={styles.railFooter}>
          <Text style={styles.railUser}>{session.user.name}</Text>
          <Text style={styles.railRole}>{ROLE_LABELS[session.user.role]}</Text>
          <Pressable
            role="button"
            aria-label="Sign out"
            onPress={() => signOut.mutate()}
            style={(state) => [styles.railItem, focusRing(state)]}
          >
            <Icon name="signOut" color={colors.railText} />
            <Text style={styles.railLabel}>Sign out</Text>
          </Pressable>
        </View>
      </View>
      <View style={styles.wideContent}>{children}</View>
    </View>
  );
}

function PhoneFrame({ session, items, children }: Props & { items: NavItem[] }) {
  const pathname = usePathname();
  const { tabs, overflow } = phoneTabs(items);
  const navigate = useNavigate();
  const insets = useSafeAreaInsets();
  return (
    <View style={styles.phoneRoot}>
      <View style={[styles.phoneHeader, { paddingTop: insets.top + space.sm }]}>
        <Logo inverse size={26} />
        <Text style={styles.phoneBrewery} numberOfLines={1}>
          {session.organisation.name}
        </Text>
      </View>
      <View style={styles.phoneContent}>{children}</View>
      <View role="navigation" aria-label="Main" style={[styles.tabBar, { paddingBottom: insets.bottom }]}>
        {tabs.map((item) => {
          const active =
            item.href === '/more'
              ? pathname === '/more' || overflow.some((o) => isActive(o, pathname))
              : isActive(item, pathname);
          return (
            <Pressable
              key={item.href}
              role="link"
              aria-current={active ? 'page' : undefined}
              aria-label={item.label}
              onPress={() => navigate(item)}
              style={(state) => [styles.tab, focusRing(state)]}
            >
              <View style={[styles.tabIcon, active && styles.tabIconActive]}>
                <Icon name={item.icon} color={active ? colors.textOnPrimary : colors.textMuted} size={22} />
              </View>
              <Text style={[styles.tabLabel, active && styles.tabLabelActive]} numberOfLines={1}>
                {item.shortLabel}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

function focusRing(state: { pressed: boolean }): ViewStyle | null {
  const { focused } = state as { focused?: boolean };
  return focused
    ? ({ outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 } as ViewStyle)
    : null;
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  rail: {
    width: 248,
    backgroundColor: colors.rail,
    paddingVertical: space.xl,
    paddingHorizontal: space.md,
    gap: space.xl,
  },
  railBrand: { gap: space.sm, paddingHorizontal: space.sm },
  railBrewery: { color: colors.railText, fontFamily: fonts.semibold, fontSize: fontSize.sm },
  railItems: { gap: space.xs, flex: 1 },
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: touchTarget,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
  },
  railItemActive: { backgroundColor: colors.railActive },
  railLabel: { color: colors.railText, fontFamily: fonts.semibold },
  railFooter: { gap: space.xxs, borderTopWidth: 1, borderTopColor: colors.railLine, paddingTop: space.md },
  railUser: { color: colors.railText, fontFamily: fonts.semibold, paddingHorizontal: space.md },
  railRole: { color: colors.railTextMuted, fontSize: fontSize.sm, paddingHorizontal: space.md, marginBottom: space.sm },
  wideContent: { flex: 1 },
  phoneRoot: { flex: 1, backgroundColor: colors.background },
  phoneHeader: {
    backgroundColor: colors.rail,
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
  },
  phoneBrewery: { color: colors.railText, fontSize: fontSize.sm, flexShrink: 1 },
  phoneContent: { flex: 1 },
  tabBar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.border,
  },
  tab: { flex: 1, alignItems: 'center', justifyContent: 'center', minHeight: 60, paddingVertical: space.xs, gap: 2 },
  tabIcon: { borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 2 },
  tabIconActive: { backgroundColor: colors.primary },
  tabLabel: { fontSize: fontSize.xs, lineHeight: 16, color: colors.textMuted, fontFamily: fonts.semibold },
  tabLabelActive: { color: colors.primary },
});
