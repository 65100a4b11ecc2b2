import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Chip, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { CatalogueSink, SinkAir } from '../catalogue-copy';
import { readText } from '../quantity-text';

export type SinkCatalogueChoiceProps = { entry: CatalogueSink; owner: string; onCopy: (air: SinkAir) => void };

/** Still air or the entry's forced-air curve at a chosen speed, then the copy. */
export function SinkCatalogueChoice({ entry, owner, onCopy }: SinkCatalogueChoiceProps) {
  const speeds = entry.forcedAir.map((p) => p.airSpeedMPerS);
  const [forced, setForced] = useState(false);
  const [speedText, setSpeedText] = useState(speeds.length > 0 ? `${speeds[Math.floor((speeds.length - 1) / 2)]} m/s` : '');
  const read = readText(speedText, 'speed');
  const lo = Math.min(...speeds);
  const hi = Math.max(...speeds);
  const speedError = !forced ? undefined : !read.ok ? read.reason : read.value < lo || read.value > hi ? `must lie within the curve, ${lo}–${hi} m/s` : undefined;

  return (
    <View style={styles.box}>
      {speeds.length > 0 ? (
        <View role="radiogroup" aria-label="Air" style={styles.chips}>
          <Chip label={`Still air, ${entry.rthKPerW} K/W at ${entry.referenceRiseK} K rise`} selected={!forced} onPress={() => setForced(false)} />
          <Chip label="Forced air" selected={forced} onPress={() => setForced(true)} />
        </View>
      ) : (
        <Text variant="caption" tone="muted">
          Still air: {entry.rthKPerW} K/W at {entry.referenceRiseK} K rise (no forced-air curve in the catalogue).
        </Text>
      )}
      {forced ? (
        <View style={styles.speed}>
          <TextField label="Air speed (m/s)" value={speedText} onChangeText={setSpeedText} error={speedError} autoCapitalize="none" />
        </View>
      ) : null}
      <Button
        label={`Copy into ${owner}`}
        disabled={Boolean(speedError)}
        onPress={() => onCopy(forced && read.ok ? { kind: 'forced', airSpeedMPerS: read.value } : { kind: 'still' })}
        style={styles.button}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  speed: { width: 180 },
  button: { alignSelf: 'flex-start' },
});
