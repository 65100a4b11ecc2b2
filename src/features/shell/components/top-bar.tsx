import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { BrandMark, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { TeamSwitcher } from '@/features/team/components/team-switcher';

/** Slim header of the phone layout: product mark and the current team. */
export function TopBar() {
  const insets = useSafeAreaInsets();
  return (
    <View role="banner" style={[styles.bar, { paddingTop: insets.top + spacing.sm }]}>
      <View style={styles.brand}>
        <BrandMark size={22} />
        <Text variant="bodyStrong">Junctura</Text>
      </View>
      <View style={styles.team}>
        <TeamSwitcher tone="light" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
    paddingHorizontal: spacing.lg,
    paddingBottom: spacing.sm,
    backgroundColor: color.surface,
    borderBottomWidth: 1,
    borderBottomColor: color.border,
  },
  brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  team: { flexShrink: 1, alignItems: 'flex-end' },
});
