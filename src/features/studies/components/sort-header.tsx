import { Pressable, StyleSheet, View } from 'react-native';

import { Icon, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { SortKey, StudySort } from '../study-list-query';

export type SortHeaderProps = {
  label: string;
  column: SortKey;
  sort: StudySort;
  onSort: (column: SortKey) => void;
  flex: number;
};

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;

/** A column header that sorts the table by its column; a second press reverses the order. */
export function SortHeader({ label, column, sort, onSort, flex }: SortHeaderProps) {
  const active = sort.key === column;
  const icon = active ? (sort.direction === 'asc' ? 'sortUp' : 'sortDown') : 'sortNone';
  return (
    <View role="columnheader" aria-sort={active ? ARIA_SORT[sort.direction] : 'none'} style={[styles.cell, { flex }]}>
      <Pressable
        role="button"
        accessibilityLabel={`Sort by ${label.toLowerCase()}`}
        onPress={() => onSort(column)}
        style={({ pressed }) => [styles.button, pressed && styles.pressed]}
      >
        <Text variant="label" tone={active ? 'default' : 'muted'}>
          {label}
        </Text>
        <Icon name={icon} size={16} color={active ? color.accent : color.inkFaint} />
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  cell: { paddingHorizontal: spacing.md },
  button: { flexDirection: 'row', alignItems: 'center', gap: spacing.xxs, alignSelf: 'flex-start', paddingVertical: spacing.sm },
  pressed: { opacity: 0.7 },
});
