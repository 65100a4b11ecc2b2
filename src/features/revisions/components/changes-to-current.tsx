import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { longTextChange } from '../text-change';
import type { FieldChange } from '../types';

export type ChangesToCurrentProps = {
  number: number;
  current: number;
  changes: readonly FieldChange[];
  /** The server's readable line for each change, in the same order. */
  lines: readonly string[];
};

function ChangeLine({ change, line }: { change: FieldChange | undefined; line: string }) {
  const text = change?.kind === 'changed' ? longTextChange(change.before, change.after) : null;
  if (change && text) {
    return (
      <View style={styles.text}>
        <Text variant="mono">{change.path}</Text>
        <Text variant="caption" tone="muted">
          was: {text.before}
        </Text>
        <Text variant="caption">now: {text.after}</Text>
      </View>
    );
  }
  return <Text variant="mono">{line}</Text>;
}

/** What differs between this revision and the current version, one readable line per field. */
export function ChangesToCurrent({ number, current, changes, lines }: ChangesToCurrentProps) {
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
          {lines.map((line, index) => (
            <ChangeLine key={`${index}-${line}`} change={changes[index]} line={line} />
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  lines: { gap: spacing.xs },
  text: { gap: spacing.xxs, paddingLeft: spacing.sm, borderLeftWidth: 2, borderLeftColor: color.border },
});
