import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';

import { formatBulk, formatInterfaceValue, KIND_LABELS } from '../interface-format';
import type { InterfaceMaterial } from '../types';

export function InterfaceCard({ material: m }: { material: InterfaceMaterial }) {
  return (
    <PressableLink href={`/interface-materials/${m.id}`} style={styles.card} activeStyle={styles.active}>
      <View style={styles.head}>
        <Text variant="bodyStrong" style={styles.name}>
          {m.name}
        </Text>
        {m.isDemo ? <DemoBadge /> : null}
      </View>
      <Text>{formatInterfaceValue(m)}</Text>
      <Text variant="caption" tone="faint">
        {m.kind === 'per_package' ? `${KIND_LABELS[m.kind]}: ${m.packageName ?? '—'}` : `${KIND_LABELS[m.kind]}: ${formatBulk(m)}`}
      </Text>
    </PressableLink>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.xs, padding: spacing.lg, borderRadius: radius.lg, borderWidth: 1, borderColor: color.border, backgroundColor: color.surface },
  active: { borderColor: color.accent },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: spacing.sm },
  name: { flexShrink: 1 },
});
