import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

const TABS = [
  { href: '/heatsinks', label: 'Heatsinks' },
  { href: '/interface-materials', label: 'Interface materials' },
] as const;

export type CatalogueTabsProps = { current: (typeof TABS)[number]['href'] };

/** Switches between the team's two catalogues. */
export function CatalogueTabs({ current }: CatalogueTabsProps) {
  return (
    <View role="tablist" aria-label="Catalogues" style={styles.tabs}>
      {TABS.map((tab) => {
        const active = tab.href === current;
        return (
          <PressableLink
            key={tab.href}
            href={tab.href}
            role="tab"
            aria-selected={active}
            style={[styles.tab, active && styles.active]}
            activeStyle={active ? undefined : styles.hover}
          >
            <Text variant="label" tone={active ? 'accent' : 'muted'}>
              {tab.label}
            </Text>
          </PressableLink>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  tabs: { flexDirection: 'row', gap: spacing.xs, borderBottomWidth: 1, borderBottomColor: color.border },
  tab: { paddingHorizontal: spacing.md, paddingVertical: spacing.sm, borderTopLeftRadius: radius.md, borderTopRightRadius: radius.md, borderBottomWidth: 2, borderBottomColor: 'transparent', marginBottom: -1 },
  active: { borderBottomColor: color.accent },
  hover: { backgroundColor: color.surfaceMuted },
});
