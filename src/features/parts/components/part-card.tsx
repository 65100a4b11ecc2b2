import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';
import { formatQuantity } from '@/features/studies/quantity-format';

import { KIND_LABEL, rthJcKPerW, thermalLabel } from '../part-format';
import type { Part } from '../types';
import { PartBadges } from './part-badges';

export type PartCardProps = { part: Part };

/** A part on a phone: name, kind and package, Tj,max and Rθjc, and the models it carries. */
export function PartCard({ part: p }: PartCardProps) {
  return (
    <PressableLink href={`/parts/${p.id}`} testID={`part-card-${p.id}`} style={styles.card} activeStyle={styles.active}>
      <View style={styles.head}>
        <Text variant="bodyStrong" style={styles.name}>
          {p.name}
        </Text>
        {p.isDemo ? <DemoBadge /> : null}
      </View>
      <Text tone="muted">{[KIND_LABEL[p.kind], p.packageName].filter(Boolean).join(' · ')}</Text>
      <Text>
        Tj,max {formatQuantity(p.tjMaxC, '°C')} · Rθjc {formatQuantity(rthJcKPerW(p.thermal), 'K/W')}
      </Text>
      <Text variant="caption" tone="faint">
        {thermalLabel(p.thermal)}
      </Text>
      <PartBadges part={p} withDemo={false} />
    </PressableLink>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.xs, padding: spacing.lg, borderRadius: radius.lg, borderWidth: 1, borderColor: color.border, backgroundColor: color.surface },
  active: { borderColor: color.accent },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: spacing.sm },
  name: { flexShrink: 1 },
});
