import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui';
import { spacing } from '@/constants/theme';

export type RowActionsProps = {
  /** What the row is, for screen readers: "segment 3", "term 2". */
  noun: string;
  index: number;
  count: number;
  onMove?: (by: -1 | 1) => void;
  onDuplicate?: () => void;
  onDelete: () => void;
  /** The last item of a list that needs one cannot be deleted. */
  keepOne?: boolean;
};

/** Move up, move down, duplicate and delete for one row of a list. */
export function RowActions({ noun, index, count, onMove, onDuplicate, onDelete, keepOne }: RowActionsProps) {
  return (
    <View style={styles.row}>
      {onMove ? (
        <>
          <Button label="↑" variant="ghost" accessibilityLabel={`Move ${noun} up`} disabled={index === 0} onPress={() => onMove(-1)} style={styles.small} />
          <Button label="↓" variant="ghost" accessibilityLabel={`Move ${noun} down`} disabled={index === count - 1} onPress={() => onMove(1)} style={styles.small} />
        </>
      ) : null}
      {onDuplicate ? <Button label="Duplicate" variant="ghost" accessibilityLabel={`Duplicate ${noun}`} onPress={onDuplicate} style={styles.small} /> : null}
      <Button label="Delete" variant="ghost" accessibilityLabel={`Delete ${noun}`} disabled={keepOne && count <= 1} onPress={onDelete} style={styles.small} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xxs },
  small: { minHeight: 36, paddingHorizontal: spacing.sm },
});
