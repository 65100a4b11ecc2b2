import { usePathname } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { Icon, PressableLink } from '@/components/ui';
import { color, fontFamily, fontSize, size, spacing } from '@/constants/theme';
import { useCurrentTeam } from '@/features/team/current-team';

import { phoneNavItemsFor } from '../nav-items';

/** Tab bar of the phone layout. */
export function BottomNav() {
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  const { team } = useCurrentTeam();
  return (
    <View role="navigation" aria-label="Workspace" style={[styles.bar, { paddingBottom: insets.bottom }]}>
      {phoneNavItemsFor(team?.role).map((item) => {
        const active = item.matches(pathname);
        const tint = active ? color.accent : color.inkFaint;
        return (
          <PressableLink
            key={item.href}
            href={item.href}
            aria-current={active ? 'page' : undefined}
            style={styles.item}
            activeStyle={styles.pressed}
          >
            <Icon name={item.icon} size={22} color={tint} />
            <Text style={[styles.label, { color: tint }]}>{item.label}</Text>
          </PressableLink>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    backgroundColor: color.surface,
    borderTopWidth: 1,
    borderTopColor: color.border,
  },
  item: {
    flex: 1,
    height: size.bottomNavHeight,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.xxs,
  },
  pressed: { backgroundColor: color.surfaceMuted },
  label: { fontFamily: fontFamily.medium, fontSize: fontSize.xs },
});
