import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Icon, Text } from '@/components/ui';
import { color, radius, size, spacing } from '@/constants/theme';

export type SelectOption = { value: string; label: string };
export type SelectFieldProps = { label: string; value: string; options: readonly SelectOption[]; onChange: (value: string) => void; hideLabel?: boolean };

/** A drop-down for native builds: the current choice, and the options listed under it when opened. */
export function SelectField({ label, value, options, onChange, hideLabel }: SelectFieldProps) {
  const [open, setOpen] = useState(false);
  const current = options.find((o) => o.value === value)?.label ?? value;
  return (
    <View style={styles.field}>
      {hideLabel ? null : (
        <Text variant="label" tone="muted">
          {label}
        </Text>
      )}
      <Pressable role="button" accessibilityLabel={label} aria-expanded={open} onPress={() => setOpen((o) => !o)} style={styles.box}>
        <Text style={styles.value}>{current}</Text>
        <Icon name="chevronDown" size={18} color={color.inkMuted} />
      </Pressable>
      {open ? (
        <View role="list" style={styles.list}>
          {options.map((o) => (
            <Pressable
              key={o.value}
              role="radio"
              aria-checked={o.value === value}
              onPress={() => {
                onChange(o.value);
                setOpen(false);
              }}
              style={({ pressed }) => [styles.option, o.value === value && styles.selected, pressed && styles.pressed]}
            >
              <Text>{o.label}</Text>
            </Pressable>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  box: {
    minHeight: size.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    paddingHorizontal: spacing.md,
    borderWidth: 1,
    borderColor: color.borderStrong,
    borderRadius: radius.md,
    backgroundColor: color.surface,
  },
  value: { flexShrink: 1 },
  list: { borderWidth: 1, borderColor: color.border, borderRadius: radius.md, backgroundColor: color.surface },
  option: { minHeight: size.touchTarget, justifyContent: 'center', paddingHorizontal: spacing.md },
  selected: { backgroundColor: color.accentSoft },
  pressed: { backgroundColor: color.surfaceMuted },
});
