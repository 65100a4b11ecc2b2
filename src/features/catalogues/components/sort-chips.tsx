import { StyleSheet, View } from 'react-native';

import { Chip, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

export type SortDirection = 'asc' | 'desc';
export type SortState<K extends string> = { key: K; direction: SortDirection };

export type SortChipsProps<K extends string> = {
  options: readonly { key: K; label: string }[];
  sort: SortState<K>;
  onSort: (sort: SortState<K>) => void;
};

/** Sort choices; pressing the chosen one again reverses the order. */
export function SortChips<K extends string>({ options, sort, onSort }: SortChipsProps<K>) {
  return (
    <View style={styles.row}>
      <Text variant="label" tone="muted">
        Sort by
      </Text>
      <View role="radiogroup" aria-label="Sort by" style={styles.chips}>
        {options.map((o) => {
          const selected = o.key === sort.key;
          const arrow = selected ? (sort.direction === 'asc' ? ' ↑' : ' ↓') : '';
          return (
            <Chip
              key={o.key}
              label={`${o.label}${arrow}`}
              selected={selected}
              onPress={() => onSort(selected ? { key: o.key, direction: sort.direction === 'asc' ? 'desc' : 'asc' } : { key: o.key, direction: 'asc' })}
            />
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
