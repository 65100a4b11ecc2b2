import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/ui';

import { useFieldError, useRegisterField } from '../editor-context';

export type IdEntryProps = { field: string; value: unknown; label: string; fullLabel: string; onChange: (id: string) => void; hint?: string };

/** An id that other fields refer to: the parent renames the references along with it. */
export const IdEntry = memo(function IdEntry({ field, value, label, fullLabel, onChange, hint = 'Letters, digits, _ or -; names the chart series and CSV columns.' }: IdEntryProps) {
  useRegisterField(field, fullLabel);
  const error = useFieldError(field);
  return (
    <View style={styles.field}>
      <TextField
        label={label}
        accessibilityLabel={fullLabel}
        value={typeof value === 'string' ? value : ''}
        onChangeText={onChange}
        error={error}
        hint={hint}
        autoCapitalize="none"
        autoCorrect={false}
      />
    </View>
  );
});

const styles = StyleSheet.create({
  field: { flexGrow: 1, flexBasis: 140, maxWidth: 220 },
});
