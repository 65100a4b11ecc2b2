import { memo, useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/ui';

import { useEditorActions, useFieldError, useRegisterField, useTeamDefaultNote } from '../editor-context';
import { editText, readText, unitOf, type FieldKind } from '../quantity-text';

export type QuantityFieldProps = {
  /** Form field name (`document.devices[0].tjMaxC`). */
  field: string;
  value: unknown;
  kind: FieldKind;
  label: string;
  /** Names the field for screen readers and the problem list when the label alone is ambiguous ("Segment 3 duration"). */
  fullLabel?: string;
  /** Left empty, the field is removed from the document (its default applies). */
  optional?: boolean;
  /** What an empty optional field means ("1", "0.25"); "not set" without it. */
  placeholder?: string;
  hint?: string;
  /** Width on a row of fields: narrow for table cells. */
  size?: 'cell' | 'narrow' | 'normal' | 'grow' | 'full';
};

const shown = (value: unknown, kind: FieldKind): string =>
  typeof value === 'number' ? editText(value, kind) : typeof value === 'string' ? value : '';

/** The value the text stands for, to tell an edit from outside (a copy, a restore) from typing. */
function sameValue(text: string, value: unknown, kind: FieldKind): boolean {
  if (typeof value === 'string') return text === value;
  if (value === undefined) return text.trim() === '';
  const read = readText(text, kind);
  return read.ok && typeof value === 'number' && Math.abs(read.value - value) <= 1e-12 * Math.max(1, Math.abs(value));
}

/**
 * A number with its unit: typed with SI prefixes ("500 mA", "2 ms"), stored in SI. Text that
 * does not read as a number stays in the document as typed, so the study is visibly not
 * ready, and the field says why.
 */
export const QuantityField = memo(function QuantityField({ field, value, kind, label, fullLabel, optional, placeholder, hint, size = 'normal' }: QuantityFieldProps) {
  const { set } = useEditorActions();
  const unit = unitOf(kind);
  const title = unit ? `${label} (${unit})` : label;
  const named = fullLabel ?? label;
  useRegisterField(field, named, kind);
  const problem = useFieldError(field);
  const fromTeam = useTeamDefaultNote(field, value);
  const [text, setText] = useState(() => shown(value, kind));

  useEffect(() => {
    setText((current) => (sameValue(current, value, kind) ? current : shown(value, kind)));
  }, [value, kind]);

  const onChangeText = (next: string) => {
    setText(next);
    if (next.trim() === '') {
      set(field, optional ? undefined : '');
      return;
    }
    const read = readText(next, kind);
    set(field, read.ok ? read.value : next);
  };

  // Reading errors show at once; the parser's findings arrive after a short pause.
  const local = typeof value === 'string' && !(optional && value.trim() === '') ? readText(value, kind) : null;
  const error = local && !local.ok ? local.reason : problem;

  return (
    <View style={styles[size]}>
      <TextField
        label={title}
        accessibilityLabel={unit ? `${named} (${unit})` : named}
        value={text}
        onChangeText={onChangeText}
        onBlur={() => {
          if (typeof value === 'number') setText(editText(value, kind));
        }}
        error={error}
        hint={fromTeam ? (hint ? `${fromTeam}. ${hint}` : fromTeam) : hint}
        autoCapitalize="none"
        autoCorrect={false}
        placeholder={optional ? (placeholder ?? 'not set') : undefined}
      />
    </View>
  );
});

const styles = StyleSheet.create({
  // Bases are widths: these sizes go in rows of fields (a basis in a column would set the height).
  cell: { flex: 1, minWidth: 0 },
  narrow: { flexGrow: 1, flexBasis: 100, maxWidth: 170 },
  normal: { flexGrow: 1, flexBasis: 140, maxWidth: 260 },
  grow: { flexGrow: 1, flexBasis: 200 },
  full: { width: '100%' },
});
