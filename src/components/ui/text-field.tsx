import { useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';

import { color, fontFamily, fontSize, radius, size, spacing } from '@/constants/theme';

import { Text } from './text';

export type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  /** Shown under the field in the danger tone; also exposed to assistive tech. */
  error?: string;
  hint?: string;
};

/** A labelled single- or multi-line input with an inline error line. */
export function TextField({ label, error, hint, multiline, onFocus, onBlur, ...rest }: TextFieldProps) {
  const [focused, setFocused] = useState(false);
  const message = error ?? hint;
  return (
    <View style={styles.field}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <TextInput
        accessibilityLabel={label}
        aria-invalid={Boolean(error)}
        placeholderTextColor={color.inkFaint}
        multiline={multiline}
        onFocus={(event) => {
          setFocused(true);
          onFocus?.(event);
        }}
        onBlur={(event) => {
          setFocused(false);
          onBlur?.(event);
        }}
        style={[styles.input, multiline && styles.multiline, focused && styles.focused, error ? styles.invalid : null]}
        {...rest}
      />
      {message ? (
        <Text variant="caption" tone={error ? 'danger' : 'faint'} role={error ? 'alert' : undefined}>
          {message}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  input: {
    minHeight: size.touchTarget,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 1,
    borderColor: color.borderStrong,
    borderRadius: radius.md,
    backgroundColor: color.surface,
    color: color.ink,
    fontFamily: fontFamily.regular,
    fontSize: fontSize.md,
  },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
  focused: { borderColor: color.focus },
  invalid: { borderColor: color.danger },
});
