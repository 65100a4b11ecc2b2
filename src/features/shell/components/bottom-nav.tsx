import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { Icon } from '@/components/ui';
import { color, fontFamily, fontSize, size, spacing } from '@/constants/theme';

import { NAV_ITEMS } from '../nav-items';

/** Tab bar of the phone layout. */
export function BottomNav() {
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  return (
    <View role="navigation" aria-label="Workspace" style={[styles.bar, { paddingBottom: insets.bottom }]}>
      {NAV_ITEMS.map((item) => {
        const active = item.matches(pathname);
        const tint = active ? color.accent : color.inkFaint;
        return (
          <Link key={item.href} href={item.href} asChild>
            <Pressable
              role="link"
              aria-current={active ? 'page' : undefined}
              style={({ pressed }) => [styles.item, pressed && styles.pressed]}
            >
              <Icon name={item.icon} size={22} color={tint} />
              <Text style={[styles.label, { color: tint }]}>{item.label}</Text>
            </Pressable>
          </Link>
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
