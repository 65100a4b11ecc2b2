import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Chip, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { duplicateItem, moveItem, removeItem } from '../list-edits';
import { isElectrical, type RawItem, type RawSegment } from '../types';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';
import { TextEntry } from './text-entry';

const KINDS = [
  { value: 'power', label: 'Power' },
  { value: 'electrical', label: 'Vin, Vout, Iload' },
] as const;

/** The segment as the other kind: power per device, or an operating point (left empty to fill in). */
function switchKind(segment: RawSegment, to: 'power' | 'electrical', railPlan: boolean): RawSegment {
  const { powerW: _p, vinV: _vi, voutV: _vo, iloadA: _i, devices: _d, ...rest } = segment;
  if (to === 'power') return { ...rest, powerW: {} };
  return railPlan ? { ...rest, voutV: '', iloadA: '' } : { ...rest, vinV: '', voutV: '', iloadA: '' };
}

export type SegmentRowProps = {
  /** Form field of the list holding it. */
  listField: string;
  segment: RawSegment;
  index: number;
  count: number;
  /** "3", or "2.1" inside a group. */
  number: string;
  /** Device ids joined by "," (a string, so the row only redraws when they change). */
  deviceIds: string;
  railPlan: boolean;
};

/** One segment of the load profile: its length and either power per device or an operating point. */
export const SegmentRow = memo(function SegmentRow({ listField, segment, index, count, number, deviceIds, railPlan }: SegmentRowProps) {
  const { set, update } = useEditorActions();
  const field = at(listField, index);
  const rowError = useFieldError(field);
  const ids = deviceIds ? deviceIds.split(',') : [];
  const electrical = isElectrical(segment);
  const name = `Segment ${number}`;
  const fed = segment.devices ?? [];

  return (
    <View style={styles.row} testID={`segment-${number}`}>
      <View style={styles.head}>
        <Text variant="label" style={styles.number}>
          {name}
        </Text>
        <View role="radiogroup" aria-label={`${name} load given as`} style={styles.kinds}>
          {KINDS.map((k) => (
            <Chip
              key={k.value}
              label={k.value === 'electrical' && railPlan ? 'Vout, Iload' : k.label}
              selected={(electrical ? 'electrical' : 'power') === k.value}
              onPress={() => k.value !== (electrical ? 'electrical' : 'power') && set(field, switchKind(segment, k.value, railPlan))}
            />
          ))}
        </View>
        <View style={styles.spacer} />
        <RowActions
          noun={`segment ${number}`}
          index={index}
          count={count}
          onMove={(by) => update<RawItem[]>(listField, (list) => moveItem(list, index, by))}
          onDuplicate={() => update<RawItem[]>(listField, (list) => duplicateItem(list, index))}
          onDelete={() => update<RawItem[]>(listField, (list) => removeItem(list, index))}
        />
      </View>
      <View style={styles.fields}>
        <QuantityField field={at(field, 'durationS')} value={segment.durationS} kind="time" label="Duration" fullLabel={`${name} duration`} size="narrow" />
        {electrical ? (
          <>
            {railPlan ? null : <QuantityField field={at(field, 'vinV')} value={segment.vinV} kind="voltage" label="Vin" fullLabel={`${name} Vin`} size="narrow" />}
            <QuantityField field={at(field, 'voutV')} value={segment.voutV} kind="voltage" label="Vout" fullLabel={`${name} Vout`} size="narrow" optional />
            <QuantityField field={at(field, 'iloadA')} value={segment.iloadA} kind="current" label="Iload" fullLabel={`${name} Iload`} size="narrow" />
          </>
        ) : (
          ids.map((id) => (
            <QuantityField
              key={id}
              field={at(at(field, 'powerW'), id)}
              value={segment.powerW?.[id]}
              kind="power"
              label={`P ${id}`}
              fullLabel={`${name} power of ${id}`}
              size="narrow"
              optional
            />
          ))
        )}
        <TextEntry field={at(field, 'label')} value={segment.label} label="Label" fullLabel={`${name} label`} optional size="normal" />
      </View>
      {electrical && ids.length > 1 ? (
        <View style={styles.foot}>
          <View style={styles.fed}>
            <Text variant="label" tone="muted">
              Feeds
            </Text>
            <View style={styles.chips}>
              <Chip label="Every pass device" selected={fed.length === 0} onPress={() => set(at(field, 'devices'), undefined)} />
              {ids.map((id) => (
                <Chip
                  key={id}
                  label={id}
                  selected={fed.includes(id)}
                  onPress={() => {
                    const next = fed.includes(id) ? fed.filter((d) => d !== id) : [...fed, id];
                    set(at(field, 'devices'), next.length > 0 ? next : undefined);
                  }}
                />
              ))}
            </View>
          </View>
        </View>
      ) : null}
      {rowError ? (
        <Text variant="caption" tone="danger" role="alert">
          {rowError}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  row: { gap: spacing.sm, padding: spacing.sm, borderRadius: radius.md, borderWidth: 1, borderColor: color.border, backgroundColor: color.surface },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.xs },
  number: { color: color.inkMuted, minWidth: 84 },
  kinds: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  spacer: { flexGrow: 1 },
  fields: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  foot: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  fed: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
