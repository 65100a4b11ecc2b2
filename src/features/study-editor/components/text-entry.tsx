import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/ui';

import { useEditorActions, useFieldError, useRegisterField } from '../editor-context';

export type TextEntryProps = {
  field: string;
  value: unknown;
  label: string;
  fullLabel?: string;
  /** Left empty, the field is removed from the document. */
  optional?: boolean;
  multiline?: boolean;
  hint?: string;
  size?: 'narrow' | 'normal' | 'grow' | 'full';
  /** A second field that takes the same text (the study's title and the document's). */
  mirror?: string;
};

/** A text field of the document (an id, a name, a label), bound to its form field. */
export const TextEntry = memo(function TextEntry({ field, value, label, fullLabel, optional, multiline, hint, size = 'normal', mirror }: TextEntryProps) {
  const { set } = useEditorActions();
  useRegisterField(field, fullLabel ?? label);
  const error = useFieldError(field);
  return (
    <View style={styles[size]}>
      <TextField
        label={label}
        accessibilityLabel={fullLabel ?? label}
        value={typeof value === 'string' ? value : ''}
        onChangeText={(text) => {
          const next = optional && text === '' ? undefined : text;
          set(field, next);
          if (mirror) set(mirror, next);
        }}
        error={error}
        hint={hint}
        multiline={multiline}
        autoCapitalize="none"
        autoCorrect={false}
        placeholder={optional ? 'not set' : undefined}
      />
    </View>
  );
});

const styles = StyleSheet.create({
  // Bases are widths: these sizes go in rows of fields (a basis in a column would set the height).
  narrow: { flexGrow: 1, flexBasis: 100, maxWidth: 170 },
  normal: { flexGrow: 1, flexBasis: 140, maxWidth: 260 },
  grow: { flexGrow: 1, flexBasis: 200 },
  full: { width: '100%' },
});
