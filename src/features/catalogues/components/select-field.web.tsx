import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, fontFamily, fontSize, radius, size, spacing } from '@/constants/theme';

export type SelectOption = { value: string; label: string };
export type SelectFieldProps = { label: string; value: string; options: readonly SelectOption[]; onChange: (value: string) => void; hideLabel?: boolean };

/** The browser's own drop-down, styled like the text fields. */
export function SelectField({ label, value, options, onChange, hideLabel }: SelectFieldProps) {
  return (
    <View style={styles.field}>
      {hideLabel ? null : (
        <Text variant="label" tone="muted">
          {label}
        </Text>
      )}
      <select aria-label={label} value={value} onChange={(e) => onChange(e.target.value)} style={selectStyle}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </View>
  );
}

const selectStyle = {
  minHeight: size.touchTarget,
  width: '100%',
  paddingLeft: spacing.md,
  paddingRight: spacing.md,
  borderWidth: 1,
  borderStyle: 'solid',
  borderColor: color.borderStrong,
  borderRadius: radius.md,
  backgroundColor: color.surface,
  color: color.ink,
  fontFamily: fontFamily.regular,
  fontSize: fontSize.md,
} as const;

const styles = StyleSheet.create({
  field: { gap: spacing.xs, minWidth: 0 },
});
