import { ActivityIndicator, Pressable, StyleSheet, Text, type PressableProps, type StyleProp, type ViewStyle } from 'react-native';

import { color, fontFamily, fontSize, radius, size, spacing } from '@/constants/theme';

export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger';

export type ButtonProps = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  variant?: ButtonVariant;
  /** Shows a spinner and blocks presses, e.g. while a form is sending. */
  busy?: boolean;
  style?: StyleProp<ViewStyle>;
};

export function Button({ label, variant = 'primary', busy = false, disabled, style, ...rest }: ButtonProps) {
  const inactive = Boolean(disabled) || busy;
  return (
    <Pressable
      role="button"
      accessibilityState={{ disabled: inactive, busy }}
      aria-disabled={inactive}
      disabled={inactive}
      style={({ pressed }) => [
        styles.base,
        containers[variant],
        pressed && !inactive && pressedStyles[variant],
        inactive && styles.inactive,
        style,
      ]}
      {...rest}
    >
      {busy ? <ActivityIndicator size="small" color={variant === 'primary' || variant === 'danger' ? color.onAccent : color.accent} /> : null}
      <Text style={[styles.label, labels[variant]]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: size.touchTarget,
    paddingHorizontal: spacing.lg,
    borderRadius: radius.md,
    borderWidth: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.sm,
  },
  inactive: { opacity: 0.55 },
  label: { fontFamily: fontFamily.medium, fontSize: fontSize.md },
});

const containers = StyleSheet.create({
  primary: { backgroundColor: color.accent, borderColor: color.accent },
  secondary: { backgroundColor: color.surface, borderColor: color.borderStrong },
  ghost: { backgroundColor: 'transparent', borderColor: 'transparent', paddingHorizontal: spacing.sm },
  danger: { backgroundColor: color.danger, borderColor: color.danger },
});

const pressedStyles = StyleSheet.create({
  primary: { backgroundColor: color.accentPressed, borderColor: color.accentPressed },
  secondary: { backgroundColor: color.surfaceMuted },
  ghost: { backgroundColor: color.surfaceMuted },
  danger: { opacity: 0.85 },
});

const labels = StyleSheet.create({
  primary: { color: color.onAccent },
  secondary: { color: color.ink },
  ghost: { color: color.accent },
  danger: { color: color.onAccent },
});
