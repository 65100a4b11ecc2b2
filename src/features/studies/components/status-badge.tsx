import { StyleSheet, Text, View } from 'react-native';

import { fontFamily, fontSize, radius, spacing } from '@/constants/theme';

import { STATUS_COLORS, STATUS_LABELS } from '../status';
import type { StudyStatus } from '../types';

export type StatusBadgeProps = { status: StudyStatus };

export function StatusBadge({ status }: StatusBadgeProps) {
  const tint = STATUS_COLORS[status];
  return (
    <View style={[styles.badge, { backgroundColor: tint.bg }]}>
      <View style={[styles.dot, { backgroundColor: tint.fg }]} />
      <Text style={[styles.label, { color: tint.fg }]}>{STATUS_LABELS[status]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radius.pill,
  },
  dot: { width: 6, height: 6, borderRadius: 3 },
  label: { fontFamily: fontFamily.medium, fontSize: fontSize.xs },
});
