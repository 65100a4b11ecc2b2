import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';

import { formatExponent, formatForcedAir, formatMass, formatPrice, formatRth, formatSize } from '../heatsink-format';
import type { Heatsink } from '../types';

export type HeatsinkCardProps = { heatsink: Heatsink };

/** A heatsink on a phone: name, still-air Rθsa and the other key values in a few lines. */
export function HeatsinkCard({ heatsink: h }: HeatsinkCardProps) {
  return (
    <PressableLink href={`/heatsinks/${h.id}`} testID={`heatsink-card-${h.id}`} style={styles.card} activeStyle={styles.active}>
      <View style={styles.head}>
        <Text variant="bodyStrong" style={styles.name}>
          {h.name}
        </Text>
        {h.isDemo ? <DemoBadge /> : null}
      </View>
      <Text>Rθsa {formatRth(h)}</Text>
      <Text variant="caption" tone="muted">
        Exponent n {formatExponent(h.convectionExponent)}
      </Text>
      {h.forcedAir.length ? (
        <Text variant="caption" tone="muted">
          Forced air: {formatForcedAir(h.forcedAir)}
        </Text>
      ) : null}
      <Text variant="caption" tone="faint">
        {[formatMass(h.massKg), formatSize(h), `${h.devicesPerSink} ${h.devicesPerSink === 1 ? 'device' : 'devices'}`, `price ${formatPrice(h.price)}`].join(' · ')}
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
