import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/ui';

import type { FieldSpec } from '../geometry-fields';

export type GeometryFieldProps = { spec: FieldSpec; value: string; onChange: (text: string) => void; error?: string; hint?: string };

/** One dimension or property, its unit in the label; prefixes such as "0.1 m" or "35 µm" are accepted. */
export function GeometryField({ spec, value, onChange, error, hint }: GeometryFieldProps) {
  return (
    <View style={styles.field}>
      <TextField
        label={spec.unit ? `${spec.label} (${spec.unit})` : spec.label}
        value={value}
        onChangeText={onChange}
        error={error}
        hint={hint}
        autoCapitalize="none"
        autoCorrect={false}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { flexGrow: 1, flexBasis: 150, maxWidth: 240 },
});
