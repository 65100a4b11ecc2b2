import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';

export type TwoColumnsProps = {
  children: [ReactNode, ReactNode];
  /** Share of the width the first column takes on a wide window (the second gets the rest). */
  firstShare?: number;
};

/** Two columns side by side on a wide window, one above the other on a phone. */
export function TwoColumns({ children: [first, second], firstShare = 0.5 }: TwoColumnsProps) {
  const wide = useIsWide();
  if (!wide) {
    return (
      <View style={styles.stack}>
        {first}
        {second}
      </View>
    );
  }
  return (
    <View style={styles.row}>
      <View style={[styles.column, { flex: firstShare }]}>{first}</View>
      <View style={[styles.column, { flex: 1 - firstShare }]}>{second}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.md },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  column: { minWidth: 0, gap: spacing.md },
});
