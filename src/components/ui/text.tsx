import { StyleSheet, Text as NativeText, type TextProps as NativeTextProps } from 'react-native';

import { color, fontFamily, fontSize, lineHeight } from '@/constants/theme';

export type TextVariant = 'display' | 'title' | 'heading' | 'body' | 'bodyStrong' | 'label' | 'caption' | 'mono';
export type TextTone = 'default' | 'muted' | 'faint' | 'danger' | 'accent' | 'inverse';

export type TextProps = NativeTextProps & {
  variant?: TextVariant;
  tone?: TextTone;
};

/** Text in the app's type scale; headings get the heading role for screen readers. */
export function Text({ variant = 'body', tone = 'default', style, ...rest }: TextProps) {
  const isHeading = variant === 'display' || variant === 'title' || variant === 'heading';
  return (
    <NativeText
      role={isHeading ? 'heading' : undefined}
      style={[styles.base, variants[variant], tones[tone], style]}
      {...rest}
    />
  );
}

const styles = StyleSheet.create({
  base: { color: color.ink, fontFamily: fontFamily.regular },
});

const variants = StyleSheet.create({
  display: { fontFamily: fontFamily.semiBold, fontSize: fontSize.display, lineHeight: lineHeight.display },
  title: { fontFamily: fontFamily.semiBold, fontSize: fontSize.xxl, lineHeight: lineHeight.xxl },
  heading: { fontFamily: fontFamily.semiBold, fontSize: fontSize.lg, lineHeight: lineHeight.lg },
  body: { fontSize: fontSize.md, lineHeight: lineHeight.md },
  bodyStrong: { fontFamily: fontFamily.medium, fontSize: fontSize.md, lineHeight: lineHeight.md },
  label: { fontFamily: fontFamily.medium, fontSize: fontSize.sm, lineHeight: lineHeight.sm },
  caption: { fontSize: fontSize.xs, lineHeight: lineHeight.xs },
  mono: { fontFamily: fontFamily.mono, fontSize: fontSize.sm, lineHeight: lineHeight.sm },
});

const tones = StyleSheet.create({
  default: { color: color.ink },
  muted: { color: color.inkMuted },
  faint: { color: color.inkFaint },
  danger: { color: color.danger },
  accent: { color: color.accent },
  inverse: { color: color.onAccent },
});
