import { usePathname } from 'expo-router';
import { Pressable, StyleSheet, Text as NativeText, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { BrandMark, Icon, PressableLink } from '@/components/ui';
import { color, fontFamily, fontSize, radius, size, spacing } from '@/constants/theme';
import type { Session } from '@/features/auth/types';
import { TeamSwitcher } from '@/features/team/components/team-switcher';
import { useCurrentTeam } from '@/features/team/current-team';

import { navItemsFor } from '../nav-items';

export type SidebarProps = { session: Session; onSignOut: () => void; signingOut: boolean };

/** Navigation column of the wide layout, with who is signed in and the sign-out action. */
export function Sidebar({ session, onSignOut, signingOut }: SidebarProps) {
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  const { team } = useCurrentTeam();
  return (
    <View style={[styles.sidebar, { paddingTop: insets.top + spacing.xl, paddingBottom: insets.bottom + spacing.lg }]}>
      <View style={styles.brand}>
        <BrandMark size={26} tone="light" />
        <NativeText style={styles.brandName}>Junctura</NativeText>
      </View>
      <View role="navigation" aria-label="Workspace" style={styles.nav}>
        {navItemsFor(team?.role).map((item) => {
          const active = item.matches(pathname);
          return (
            <PressableLink
              key={item.href}
              href={item.href}
              aria-current={active ? 'page' : undefined}
              style={[styles.item, active && styles.itemActive]}
              activeStyle={styles.itemActive}
            >
              <Icon name={item.icon} size={20} color={active ? color.onAccent : color.sidebarMuted} />
              <NativeText style={[styles.itemLabel, active && styles.itemLabelActive]}>{item.label}</NativeText>
            </PressableLink>
          );
        })}
      </View>
      <View style={styles.spacer} />
      <View style={styles.user}>
        <NativeText style={styles.userName}>{session.user.name}</NativeText>
        <NativeText style={styles.userMeta} numberOfLines={1}>
          {session.user.email}
        </NativeText>
        <TeamSwitcher tone="dark" />
        <Pressable
          role="button"
          onPress={onSignOut}
          disabled={signingOut}
          style={({ pressed }) => [styles.signOut, pressed && styles.itemActive]}
        >
          <Icon name="signOut" size={18} color={color.sidebarText} />
          <NativeText style={styles.signOutLabel}>{signingOut ? 'Signing out…' : 'Sign out'}</NativeText>
        </Pressable>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  sidebar: {
    width: size.sidebarWidth,
    backgroundColor: color.sidebar,
    paddingHorizontal: spacing.md,
    gap: spacing.xl,
  },
  brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingHorizontal: spacing.sm },
  brandName: { color: color.onAccent, fontFamily: fontFamily.semiBold, fontSize: fontSize.xl },
  nav: { gap: spacing.xs },
  item: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: size.touchTarget,
    paddingHorizontal: spacing.md,
    borderRadius: radius.md,
  },
  itemActive: { backgroundColor: color.sidebarActive },
  itemLabel: { color: color.sidebarText, fontFamily: fontFamily.medium, fontSize: fontSize.md },
  itemLabelActive: { color: color.onAccent },
  spacer: { flex: 1 },
  user: {
    gap: spacing.xxs,
    paddingHorizontal: spacing.sm,
    paddingTop: spacing.lg,
    borderTopWidth: 1,
    borderTopColor: color.sidebarActive,
  },
  userName: { color: color.onAccent, fontFamily: fontFamily.medium, fontSize: fontSize.md },
  userMeta: { color: color.sidebarMuted, fontFamily: fontFamily.regular, fontSize: fontSize.xs },
  signOut: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    minHeight: 36,
    marginTop: spacing.md,
    marginHorizontal: -spacing.sm,
    paddingHorizontal: spacing.sm,
    borderRadius: radius.md,
  },
  signOutLabel: { color: color.sidebarText, fontFamily: fontFamily.medium, fontSize: fontSize.sm },
});
