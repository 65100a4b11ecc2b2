import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { DefaultLine } from '../team-settings-lines';

export type DefaultsListProps = { lines: readonly DefaultLine[]; testID?: string };

/** Defaults read-only: each value with where it comes from. */
export function DefaultsList({ lines, testID }: DefaultsListProps) {
  return (
    <View style={styles.list} testID={testID}>
      {lines.map((l) => (
        <View key={l.key} style={styles.row} testID={`default-${l.key}`}>
          <View style={styles.head}>
            <Text variant="label">{l.label}</Text>
            <Text tone={l.fromTeam ? 'default' : 'muted'}>{l.value}</Text>
          </View>
          <Text variant="caption" tone="faint">
            {!l.fromTeam ? l.source : l.source === 'team setting' ? 'Team default (no source given)' : `Team default · ${l.source}`}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: { gap: spacing.xxs, paddingBottom: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', columnGap: spacing.md },
});
