import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

export type ChangesToCurrentProps = { number: number; current: number; lines: readonly string[] };

/** What differs between this revision and the current version, one readable line per field. */
export function ChangesToCurrent({ number, current, lines }: ChangesToCurrentProps) {
  return (
    <Card role="region" aria-label="Compared with the current version">
      <Text variant="heading">Compared with the current version (v{current})</Text>
      {number === current ? (
        <Text tone="muted">This is the current version.</Text>
      ) : lines.length === 0 ? (
        <Text tone="muted">Same content as the current version.</Text>
      ) : (
        <View style={styles.lines}>
          <Text variant="caption" tone="muted">
            From revision {number} to the current version:
          </Text>
          {lines.map((line) => (
            <Text key={line} variant="mono">
              {line}
            </Text>
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  lines: { gap: spacing.xxs },
});
