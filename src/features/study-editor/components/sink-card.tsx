import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useCatalogueSinks } from '../api';
import { sinkFromCatalogue, type CatalogueSink } from '../catalogue-copy';
import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { renameSink } from '../id-refs';
import { moveItem, nextId } from '../list-edits';
import type { RawDocument, RawSink } from '../types';
import { ChoiceRow } from './choice-row';
import { IdEntry } from './id-entry';
import { LibraryPicker } from './library-picker';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';
import { SinkAirFields } from './sink-air-fields';
import { SinkCatalogueChoice } from './sink-catalogue-choice';
import { TextEntry } from './text-entry';

type Mass = 'none' | 'capacity' | 'mass';
const MASS = [
  { value: 'none', label: 'Massless' },
  { value: 'capacity', label: 'Heat capacity' },
  { value: 'mass', label: 'Mass and material' },
] as const;
const MATERIALS = [
  { value: 'aluminium', label: 'Aluminium' },
  { value: 'copper', label: 'Copper' },
] as const;

const massOf = (sink: RawSink): Mass => (sink.capacityJPerK !== undefined ? 'capacity' : sink.massKg !== undefined || sink.material !== undefined ? 'mass' : 'none');

function switchMass(sink: RawSink, to: Mass): RawSink {
  const { capacityJPerK: _c, massKg: _m, material: _mat, ...rest } = sink;
  if (to === 'capacity') return { ...rest, capacityJPerK: '' };
  if (to === 'mass') return { ...rest, massKg: '', material: 'aluminium' };
  return rest;
}

const describeEntry = (h: CatalogueSink) =>
  [
    `${h.rthKPerW} K/W at ${h.referenceRiseK} K`,
    // The still-air exponent when the catalogue gives one (1/4 otherwise, left unsaid).
    h.convectionExponent != null ? `n = ${Number(h.convectionExponent.toPrecision(3))}` : null,
    h.forcedAir.length > 0 ? `forced air ${h.forcedAir.map((p) => p.airSpeedMPerS).join('/')} m/s` : null,
    h.massKg !== null ? `${Number((h.massKg * 1000).toPrecision(4))} g${h.material ? ` ${h.material}` : ''}` : null,
    h.capacityJPerK !== null ? `${h.capacityJPerK} J/K` : null,
  ]
    .filter(Boolean)
    .join(' · ');

export type SinkCardProps = { sink: RawSink; index: number; count: number; sinkIds: string[]; hasEnclosure: boolean; teamId: number };

/** One heatsink (or PCB copper): how it sheds heat, its heat capacity, and where its Rθsa leads. */
export const SinkCard = memo(function SinkCard({ sink, index, count, sinkIds, hasEnclosure, teamId }: SinkCardProps) {
  const { set, update } = useEditorActions();
  const [picking, setPicking] = useState(false);
  const [copied, setCopied] = useState<string | null>(null);
  const catalogue = useCatalogueSinks(teamId, picking);
  const field = at('document.sinks', index);
  const owner = sink.id || `sink ${index + 1}`;
  const toError = useFieldError(at(field, 'to'));
  const materialError = useFieldError(at(field, 'material'));
  const mass = massOf(sink);
  const targets = [
    { value: '', label: hasEnclosure ? 'Enclosure air (default)' : 'Ambient (default)' },
    { value: 'ambient', label: 'Ambient' },
    ...(hasEnclosure ? [{ value: 'enclosure', label: 'Enclosure air' }] : []),
    ...sinkIds.filter((id) => id !== sink.id).map((id) => ({ value: id, label: `Sink ${id}` })),
  ];

  return (
    <View style={styles.card} testID={`sink-${index}`}>
      <View style={styles.head}>
        <Text variant="bodyStrong" style={styles.title}>
          {sink.name || owner}{' '}
          <Text variant="mono" tone="faint">
            {sink.id}
          </Text>
        </Text>
        <RowActions
          noun={`sink ${owner}`}
          index={index}
          count={count}
          keepOne
          onMove={(by) => update<RawSink[]>('document.sinks', (list) => moveItem(list, index, by))}
          onDuplicate={() =>
            update<RawSink[]>('document.sinks', (list) => {
              const next = [...list];
              next.splice(index + 1, 0, { ...(JSON.parse(JSON.stringify(sink)) as RawSink), id: nextId('S', sinkIds) });
              return next;
            })
          }
          onDelete={() => update<RawSink[]>('document.sinks', (list) => list.filter((_, i) => i !== index))}
        />
      </View>
      <View style={styles.row}>
        <IdEntry field={at(field, 'id')} value={sink.id} label="Id" fullLabel={`Sink ${index + 1} id`} onChange={(id) => update<RawDocument>('document', (doc) => renameSink(doc, index, id))} />
        <TextEntry field={at(field, 'name')} value={sink.name} label="Name" fullLabel={`${owner} name`} optional size="grow" />
      </View>

      <View style={styles.library}>
        {picking ? (
          <LibraryPicker<CatalogueSink>
            title="Heatsink catalogue"
            query={catalogue}
            empty="The team’s heatsink catalogue is empty."
            describe={describeEntry}
            renderChoice={(entry) => (
              <SinkCatalogueChoice
                entry={entry}
                owner={owner}
                onCopy={(air) => {
                  set(field, sinkFromCatalogue(sink, entry, air));
                  setCopied(entry.name);
                  setPicking(false);
                }}
              />
            )}
            onClose={() => setPicking(false)}
          />
        ) : (
          <Button label="From the catalogue" variant="secondary" accessibilityLabel={`${owner} from the heatsink catalogue`} onPress={() => setPicking(true)} style={styles.button} />
        )}
        {copied ? (
          <Text variant="caption" tone="muted">
            Copied from “{copied}”. Later changes in the catalogue do not reach this study.
          </Text>
        ) : null}
      </View>

      <SinkAirFields field={field} sink={sink} owner={owner} />
      <ChoiceRow label="Heat capacity" value={mass} options={MASS} onChange={(to) => to !== mass && set(field, switchMass(sink, to))} />
      {mass === 'capacity' ? (
        <View style={styles.row}>
          <QuantityField field={at(field, 'capacityJPerK')} value={sink.capacityJPerK} kind="heatCapacity" label="Heat capacity" fullLabel={`${owner} heat capacity`} />
        </View>
      ) : null}
      {mass === 'mass' ? (
        <View style={styles.row}>
          <QuantityField field={at(field, 'massKg')} value={sink.massKg} kind="mass" label="Mass" fullLabel={`${owner} mass`} hint="900 J/(kg·K) aluminium, 385 copper." />
          <ChoiceRow label="Material" value={(sink.material ?? '') as 'aluminium' | 'copper'} options={MATERIALS} onChange={(m) => set(at(field, 'material'), m)} error={materialError} />
        </View>
      ) : null}
      <ChoiceRow label="Rθsa leads to" value={sink.to ?? ''} options={targets} onChange={(to) => set(at(field, 'to'), to === '' ? undefined : to)} error={toError} />
    </View>
  );
});

const styles = StyleSheet.create({
  card: { gap: spacing.md, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.border, backgroundColor: color.canvas },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  title: { flexShrink: 1 },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
  library: { gap: spacing.xs },
  button: { alignSelf: 'flex-start' },
});
