import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/ui';

import { usePartForm } from './form-context';

export type NumberFieldProps = {
  label: string;
  /** The unit a bare number is read in, shown after the label. */
  unit?: string;
  /** API path of the value (`soa.icMaxA`): its messages, from the form or the server, show here. */
  path: string;
  value: string;
  onChange: (text: string) => void;
  /** Names the field for screen readers when the label alone is ambiguous ("R of term 2"). */
  fullLabel?: string;
  hint?: string;
  placeholder?: string;
  size?: 'narrow' | 'normal' | 'grow' | 'cell' | 'full';
};

/** A number typed with its unit or an SI prefix ("2 ms", "500 mA"); the label names the bare unit. */
export function NumberField({ label, unit, path, value, onChange, fullLabel, hint, placeholder, size = 'grow' }: NumberFieldProps) {
  const { errorAt, touch } = usePartForm();
  const title = unit ? `${label} (${unit})` : label;
  return (
    <View style={styles[size]} testID={`field-${path}`}>
      <TextField
        label={title}
        accessibilityLabel={fullLabel ? (unit ? `${fullLabel} (${unit})` : fullLabel) : title}
        value={value}
        onChangeText={onChange}
        onBlur={() => touch(path)}
        error={errorAt(path)}
        hint={hint}
        placeholder={placeholder}
        autoCapitalize="none"
        autoCorrect={false}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  narrow: { width: 124 },
  normal: { width: 180 },
  grow: { flexGrow: 1, flexBasis: 140, minWidth: 0, maxWidth: 360 },
  // Two to a row even in a phone's table.
  cell: { flexGrow: 1, flexBasis: 84, minWidth: 0, maxWidth: 360 },
  full: { width: '100%' },
});
