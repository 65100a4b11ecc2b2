import { StyleSheet, View } from 'react-native';

import { Chip, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { STUDY_STATUSES } from '@/validation';

import { STATUS_LABELS } from '../status';
import type { StatusFilter } from '../study-list-query';

export type StudyFiltersProps = {
  search: string;
  onSearch: (text: string) => void;
  status: StatusFilter;
  onStatus: (status: StatusFilter) => void;
  wide: boolean;
};

const OPTIONS: { value: StatusFilter; label: string }[] = [
  { value: 'all', label: 'All' },
  ...STUDY_STATUSES.map((value) => ({ value, label: STATUS_LABELS[value] })),
];

export function StudyFilters({ search, onSearch, status, onStatus, wide }: StudyFiltersProps) {
  return (
    <View style={[styles.bar, wide && styles.barWide]}>
      <View style={wide ? styles.searchWide : undefined}>
        <TextField
          label="Search studies"
          placeholder="Title, description, author…"
          value={search}
          onChangeText={onSearch}
          autoCapitalize="none"
          autoCorrect={false}
          inputMode="search"
        />
      </View>
      <View role="radiogroup" aria-label="Filter by status" style={styles.chips}>
        {OPTIONS.map((option) => (
          <Chip
            key={option.value}
            label={option.label}
            selected={status === option.value}
            onPress={() => onStatus(option.value)}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: spacing.md },
  barWide: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.xl },
  searchWide: { width: 320 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, alignItems: 'center' },
});
