import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { duplicateItem, moveItem, removeItem } from '../list-edits';
import { isElectrical, isGroup, type RawGroup, type RawItem, type RawSegment } from '../types';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';
import { SegmentRow } from './segment-row';
import { TextEntry } from './text-entry';

/** Rows drawn at first; a logged profile can hold thousands. */
const PAGE = 50;

/** An empty segment like the last one (power, or an operating point), for the user to fill in. */
export function blankSegmentLike(items: readonly RawItem[], railPlan: boolean): RawSegment {
  const last = [...items].reverse().find((i): i is RawSegment => !isGroup(i));
  if (last && isElectrical(last)) return railPlan ? { durationS: '', voutV: '', iloadA: '' } : { durationS: '', vinV: '', voutV: '', iloadA: '' };
  return { durationS: '', powerW: {} };
}

export type SegmentListProps = { field: string; items: RawItem[] | undefined; deviceIds: string; railPlan: boolean; prefix?: string };

/** The segments and groups of one list, in order; groups hold their own list. */
export const SegmentList = memo(function SegmentList({ field, items = [], deviceIds, railPlan, prefix = '' }: SegmentListProps) {
  const { update } = useEditorActions();
  const listError = useFieldError(field);
  const [shown, setShown] = useState(PAGE);
  return (
    <View style={styles.list}>
      {items.slice(0, shown).map((item, i) =>
        isGroup(item) ? (
          <GroupBlock key={i} listField={field} group={item} index={i} count={items.length} number={`${prefix}${i + 1}`} deviceIds={deviceIds} railPlan={railPlan} />
        ) : (
          <SegmentRow key={i} listField={field} segment={item} index={i} count={items.length} number={`${prefix}${i + 1}`} deviceIds={deviceIds} railPlan={railPlan} />
        ),
      )}
      {items.length > shown ? (
        <Button label={`Show ${Math.min(PAGE, items.length - shown)} more of ${items.length - shown} hidden`} variant="secondary" onPress={() => setShown((n) => n + PAGE)} style={styles.button} />
      ) : null}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button
        label={prefix ? `Add segment to group ${prefix.slice(0, -1)}` : 'Add segment'}
        variant="secondary"
        onPress={() => {
          update<RawItem[] | undefined>(field, (list) => [...(list ?? []), blankSegmentLike(list ?? [], railPlan)]);
          setShown((n) => Math.max(n, items.length + 1));
        }}
        style={styles.button}
      />
    </View>
  );
});

type GroupBlockProps = { listField: string; group: RawGroup; index: number; count: number; number: string; deviceIds: string; railPlan: boolean };

/** A group: its segments repeated in place (a pulse train), with its repeat count and label. */
const GroupBlock = memo(function GroupBlock({ listField, group, index, count, number, deviceIds, railPlan }: GroupBlockProps) {
  const { update } = useEditorActions();
  const field = at(listField, index);
  const name = `Group ${number}`;
  return (
    <View style={styles.group} testID={`group-${number}`}>
      <View style={styles.head}>
        <Text variant="label" tone="muted">
          {name}: its segments repeated in place
        </Text>
        <RowActions
          noun={`group ${number}`}
          index={index}
          count={count}
          onMove={(by) => update<RawItem[]>(listField, (list) => moveItem(list, index, by))}
          onDuplicate={() => update<RawItem[]>(listField, (list) => duplicateItem(list, index))}
          onDelete={() => update<RawItem[]>(listField, (list) => removeItem(list, index))}
        />
      </View>
      <View style={styles.fields}>
        <QuantityField field={at(field, 'repeat')} value={group.repeat} kind="integer" label="Repeat ×" fullLabel={`${name} repeat`} size="narrow" />
        <TextEntry field={at(field, 'label')} value={group.label} label="Label" fullLabel={`${name} label`} optional size="grow" />
      </View>
      <SegmentList field={at(field, 'segments')} items={group.segments} deviceIds={deviceIds} railPlan={railPlan} prefix={`${number}.`} />
    </View>
  );
});

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  button: { alignSelf: 'flex-start' },
  group: { gap: spacing.sm, padding: spacing.sm, borderRadius: radius.md, borderWidth: 1, borderColor: color.accent, borderLeftWidth: 4, backgroundColor: color.canvas },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.xs },
  fields: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
});
