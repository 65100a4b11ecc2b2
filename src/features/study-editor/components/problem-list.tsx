import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { Problem } from '../check-document';
import { SECTION_TITLES, sectionOf } from '../field-path';

export type ProblemListProps = {
  problems: readonly Problem[];
  /** The name a field goes by on screen, when it is on screen. */
  labelOf: (field: string) => string | undefined;
  onSelect: (field: string) => void;
};

const pathText = (field: string) => field.replace(/^document\.?/, '') || 'the document';

/** Problems listed before the rest fold away, so the list does not push the editor off screen. */
const SHOWN = 4;

/** Every known problem, each naming its field and section; choosing one opens that section. */
export function ProblemList({ problems, labelOf, onSelect }: ProblemListProps) {
  const [all, setAll] = useState(false);
  if (problems.length === 0) return null;
  const shown = all ? problems : problems.slice(0, SHOWN);
  return (
    <View role="alert" style={styles.box} testID="problem-list">
      <Text variant="bodyStrong" style={styles.title}>
        {problems.length === 1 ? '1 problem to fix before saving' : `${problems.length} problems to fix before saving`}
      </Text>
      {shown.map((p) => (
        <Pressable key={`${p.field}:${p.reason}`} role="button" onPress={() => onSelect(p.field)} style={({ pressed }) => [styles.item, pressed && styles.pressed]}>
          <Text>
            <Text variant="bodyStrong">{labelOf(p.field) ?? pathText(p.field)}</Text>: {p.reason}
          </Text>
          <Text variant="caption" tone="muted">
            {SECTION_TITLES[sectionOf(p.field)]} · <Text variant="mono" tone="faint">{pathText(p.field)}</Text>
          </Text>
        </Pressable>
      ))}
      {problems.length > SHOWN ? (
        <Button label={all ? 'Show fewer' : `Show all ${problems.length}`} variant="ghost" onPress={() => setAll((a) => !a)} style={styles.more} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.danger, backgroundColor: color.dangerSoft },
  title: { color: color.danger },
  item: { gap: spacing.xxs, paddingVertical: spacing.xs, borderRadius: radius.sm },
  pressed: { backgroundColor: color.surface },
  more: { alignSelf: 'flex-start' },
});
