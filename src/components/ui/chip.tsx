import { Pressable, StyleSheet, Text } from 'react-native';

import { color, fontFamily, fontSize, radius, spacing } from '@/constants/theme';

export type ChipProps = {
  label: string;
  selected: boolean;
  onPress: () => void;
};

/** One choice in a small set of filters (rendered as a radio for assistive tech). */
export function Chip({ label, selected, onPress }: ChipProps) {
  return (
    <Pressable
      role="radio"
      aria-checked={selected}
      accessibilityState={{ checked: selected }}
      onPress={onPress}
      style={({ pressed }) => [styles.chip, selected && styles.selected, pressed && !selected && styles.pressed]}
    >
      <Text style={[styles.label, selected && styles.selectedLabel]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: {
    minHeight: 34,
    paddingHorizontal: spacing.md,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: color.borderStrong,
    backgroundColor: color.surface,
    justifyContent: 'center',
  },
  selected: { backgroundColor: color.accentSoft, borderColor: color.accent },
  pressed: { backgroundColor: color.surfaceMuted },
  label: { fontFamily: fontFamily.medium, fontSize: fontSize.sm, color: color.inkMuted },
  selectedLabel: { color: color.accent },
});
