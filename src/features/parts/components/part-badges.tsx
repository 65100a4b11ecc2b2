import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';

import type { Part } from '../types';

function Badge({ label, name }: { label: string; name: string }) {
  return (
    <View style={styles.badge} accessibilityLabel={name}>
      <Text variant="caption" style={styles.text}>
        {label}
      </Text>
    </View>
  );
}

export type PartBadgesProps = { part: Part; withDemo?: boolean };

/** Which models the part carries beyond its thermal one (SOA, electrical, Zth points), and the demo mark. */
export function PartBadges({ part, withDemo = true }: PartBadgesProps) {
  const any = part.soa || part.electrical || part.zthPoints?.length || (withDemo && part.isDemo);
  if (!any) return null;
  return (
    <View style={styles.row}>
      {part.soa ? <Badge label="SOA" name="Has an SOA model" /> : null}
      {part.electrical ? <Badge label="Electrical" name="Has an electrical model" /> : null}
      {part.zthPoints?.length ? <Badge label="Zth points" name="Has datasheet Zth points" /> : null}
      {withDemo && part.isDemo ? <DemoBadge /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  badge: {
    alignSelf: 'flex-start',
    paddingHorizontal: spacing.sm,
    paddingVertical: 1,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: color.borderStrong,
    backgroundColor: color.surfaceMuted,
  },
  text: { color: color.inkMuted, fontWeight: '500' },
});
