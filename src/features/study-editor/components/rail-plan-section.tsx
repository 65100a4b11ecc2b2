import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { moveItem, nextId, removeItem } from '../list-edits';
import { addRailPlan, addTap, changeKind, removeTap, renameSource, type RawCircuit, type RawRailPlan } from '../rail-plan-edits';
import type { RawDocument } from '../types';
import { ChoiceRow } from './choice-row';
import { IdEntry } from './id-entry';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';
import { TextEntry } from './text-entry';

const FIELD = 'document.railPlan';

/** Circuits nest at most this deep (the study format's limit). */
const MAX_DEPTH = 8;

const SENSED = [
  { value: 'output', label: 'Output reached' },
  { value: 'set-point', label: 'Set point' },
] as const;

const NODE_KINDS = [
  { value: 'source', label: 'One source' },
  { value: 'series', label: 'In series' },
  { value: 'parallel', label: 'In parallel' },
] as const;

export type RailPlanSectionProps = { plan: RawRailPlan | undefined; deviceIds: string[] };

/**
 * The rail plan: sources, taps as series/parallel circuits of sources with diodes and
 * ballasts, the thresholds between taps with their hysteresis, the relay and the map range
 * (docs/study-format.md, `railPlan`). With a plan, electrical segments give Vout and Iload
 * only: the input comes from the tap the plan selects.
 * Drawn again only when the plan or the device ids change.
 */
export const RailPlanSection = memo(function RailPlanSection({ plan, deviceIds }: RailPlanSectionProps) {
  const { set, update } = useEditorActions();
  const planError = useFieldError(FIELD);
  const deviceError = useFieldError(at(FIELD, 'device'));
  const sensedError = useFieldError(at(FIELD, 'sensed'));
  if (!plan) {
    return (
      <View style={styles.box}>
        <Text tone="muted">No rail plan: every electrical segment gives its own input voltage (Vin).</Text>
        <Text variant="caption" tone="faint">
          A plan switches several input rails into taps by thresholds on a sensed voltage. Adding one leaves Vin out of the electrical segments: the selected tap supplies it.
        </Text>
        <Button label="Add rail plan" variant="secondary" onPress={() => update<RawDocument>('document', addRailPlan)} style={styles.button} />
      </View>
    );
  }
  const updatePlan = (change: (p: RawRailPlan) => RawRailPlan) => update<RawRailPlan>(FIELD, change);
  const sources = plan.sources ?? [];
  const taps = plan.taps ?? [];
  const sourceIds = sources.map((s) => s.id ?? '');
  const thresholds = plan.thresholdsV ?? [];
  const map = plan.map ?? {};
  const relay = plan.relay;

  return (
    <View style={styles.box}>
      {planError ? (
        <Text variant="caption" tone="danger" role="alert">
          Rail plan: {planError}
        </Text>
      ) : null}
      <ChoiceRow
        label="Feeds the pass device"
        value={plan.device ?? ''}
        options={[{ value: '', label: 'The only pass device' }, ...deviceIds.map((id) => ({ value: id, label: id }))]}
        onChange={(device) => set(at(FIELD, 'device'), device === '' ? undefined : device)}
        error={deviceError}
      />

      <Group title="Sources">
        {sources.map((s, i) => {
          const owner = s.id || `source ${i + 1}`;
          const p = at(at(FIELD, 'sources'), i);
          return (
            <View key={i} style={styles.item} testID={`rail-source-${i}`}>
              <View style={styles.row}>
                <IdEntry field={at(p, 'id')} value={s.id} label="Id" fullLabel={`Source ${i + 1} id`} hint="Letters, digits, _ or -; the taps name the source by it." onChange={(id) => updatePlan((pl) => renameSource(pl, i, id))} />
                <QuantityField field={at(p, 'vocV')} value={s.vocV} kind="voltage" label="Open circuit" fullLabel={`${owner} open-circuit voltage`} size="narrow" />
                <QuantityField field={at(p, 'rsOhm')} value={s.rsOhm} kind="resistance" label="Rs" fullLabel={`${owner} source resistance`} size="narrow" />
                <QuantityField field={at(p, 'imaxA')} value={s.imaxA} kind="current" label="Rating" fullLabel={`${owner} current rating`} size="narrow" />
              </View>
              <View style={styles.row}>
                <RowActions
                  noun={`source ${owner}`}
                  index={i}
                  count={sources.length}
                  keepOne
                  onMove={(by) => updatePlan((pl) => ({ ...pl, sources: moveItem(pl.sources ?? [], i, by) }))}
                  onDelete={() => updatePlan((pl) => ({ ...pl, sources: removeItem(pl.sources ?? [], i) }))}
                />
              </View>
            </View>
          );
        })}
        <Button
          label="Add source"
          variant="secondary"
          onPress={() => updatePlan((pl) => ({ ...pl, sources: [...(pl.sources ?? []), { id: nextId('A', sourceIds), vocV: '', rsOhm: '', imaxA: '' }] }))}
          style={styles.button}
        />
      </Group>

      <Group title="Taps, lowest open-circuit voltage first">
        {taps.map((tap, i) => {
          const p = at(at(FIELD, 'taps'), i);
          const owner = tap.name || `tap ${i + 1}`;
          return (
            <View key={i} style={styles.item} testID={`rail-tap-${i}`}>
              <View style={styles.head}>
                <TextEntry field={at(p, 'name')} value={tap.name} label={`Tap ${i + 1} name`} fullLabel={`Tap ${i + 1} name`} size="grow" />
                <RowActions noun={`tap ${owner}`} index={i} count={taps.length} keepOne onDelete={() => updatePlan((pl) => removeTap(pl, i))} />
              </View>
              <CircuitNode field={at(p, 'circuit')} node={tap.circuit ?? {}} owner={owner} sourceIds={sourceIds} depth={1} />
              {i < taps.length - 1 ? (
                <View style={styles.threshold}>
                  <QuantityField
                    field={at(at(FIELD, 'thresholdsV'), i)}
                    value={thresholds[i]}
                    kind="voltage"
                    label={`Threshold to tap ${i + 2}`}
                    fullLabel={`Threshold between tap ${i + 1} and tap ${i + 2}`}
                    hint="Up above it plus half the hysteresis, down below it minus half."
                  />
                </View>
              ) : null}
            </View>
          );
        })}
        <Button label="Add tap" variant="secondary" onPress={() => updatePlan(addTap)} style={styles.button} />
      </Group>

      <Group title="Switching">
        <View style={styles.row}>
          <QuantityField field={at(FIELD, 'hysteresisV')} value={plan.hysteresisV} kind="voltage" label="Hysteresis" fullLabel="Rail plan hysteresis" />
        </View>
        <ChoiceRow label="The comparator watches" value={plan.sensed === 'set-point' ? 'set-point' : 'output'} options={SENSED} onChange={(sensed) => set(at(FIELD, 'sensed'), sensed)} error={sensedError} />
        {relay ? (
          <View style={styles.row}>
            <QuantityField field={at(at(FIELD, 'relay'), 'breakTimeS')} value={relay.breakTimeS} kind="time" label="Relay break time" fullLabel="Relay break time" />
            <QuantityField field={at(at(FIELD, 'relay'), 'inputCapacitanceF')} value={relay.inputCapacitanceF} kind="capacitance" label="Input capacitance" fullLabel="Relay input capacitance" />
            <Button label="Remove relay" variant="ghost" onPress={() => set(at(FIELD, 'relay'), undefined)} />
          </View>
        ) : (
          <Button label="Add relay (for the chatter check)" variant="secondary" onPress={() => set(at(FIELD, 'relay'), { breakTimeS: '', inputCapacitanceF: '' })} style={styles.button} />
        )}
      </Group>

      <Group title="Dissipation map range">
        <View style={styles.row}>
          <QuantityField field={at(at(FIELD, 'map'), 'voutMinV')} value={map.voutMinV} kind="voltage" label="Vout from" fullLabel="Map Vout from" size="narrow" />
          <QuantityField field={at(at(FIELD, 'map'), 'voutMaxV')} value={map.voutMaxV} kind="voltage" label="Vout to" fullLabel="Map Vout to" size="narrow" />
          <QuantityField field={at(at(FIELD, 'map'), 'ioutMaxA')} value={map.ioutMaxA} kind="current" label="Iout up to" fullLabel="Map Iout up to" size="narrow" />
          <QuantityField field={at(at(FIELD, 'map'), 'voutSteps')} value={map.voutSteps} kind="integer" label="Vout steps" fullLabel="Map Vout steps" optional placeholder="61" size="narrow" />
          <QuantityField field={at(at(FIELD, 'map'), 'ioutSteps')} value={map.ioutSteps} kind="integer" label="Iout steps" fullLabel="Map Iout steps" optional placeholder="26" size="narrow" />
        </View>
      </Group>

      {typeof plan.notes === 'string' ? (
        <Text variant="caption" tone="muted">
          {plan.notes}
        </Text>
      ) : null}
      <Button label="Remove rail plan" variant="ghost" onPress={() => set(FIELD, undefined)} style={styles.button} />
    </View>
  );
});

type CircuitNodeProps = { field: string; node: RawCircuit; owner: string; sourceIds: string[]; depth: number };

/** One node of a tap's circuit: a source, or parts in series, or branches in parallel; each with its diode drop and ballast. */
const CircuitNode = memo(function CircuitNode({ field, node, owner, sourceIds, depth }: CircuitNodeProps) {
  const { set, update } = useEditorActions();
  const kind = node.kind === 'series' || node.kind === 'parallel' ? node.kind : 'source';
  const listKey = kind === 'series' ? 'parts' : 'branches';
  const children = (kind === 'series' ? node.parts : node.branches) ?? [];
  const childNoun = kind === 'series' ? 'part' : 'branch';
  const first = sourceIds[0] ?? '';
  const sourceError = useFieldError(at(field, 'source'));
  const kindError = useFieldError(at(field, 'kind'));
  const listError = useFieldError(at(field, listKey));
  return (
    <View style={[styles.node, depth > 1 && styles.nested]}>
      <ChoiceRow
        label={depth === 1 ? `${owner}: circuit` : owner}
        value={kind}
        options={depth >= MAX_DEPTH ? NODE_KINDS.slice(0, 1) : NODE_KINDS}
        onChange={(k) => update<RawCircuit>(field, (n) => changeKind(n ?? {}, k, first))}
        error={kindError}
      />
      {kind === 'source' ? (
        <ChoiceRow label="Source" value={node.source ?? ''} options={sourceIds.map((id) => ({ value: id, label: id }))} onChange={(s) => set(at(field, 'source'), s)} error={sourceError} />
      ) : null}
      <View style={styles.row}>
        <QuantityField field={at(field, 'diodeV')} value={node.diodeV} kind="voltage" label="Diode drop" fullLabel={`${owner} diode drop`} optional placeholder="none" size="narrow" />
        <QuantityField field={at(field, 'ballastOhm')} value={node.ballastOhm} kind="resistance" label="Ballast" fullLabel={`${owner} ballast`} optional placeholder="none" size="narrow" />
        {kind === 'parallel' ? (
          <QuantityField field={at(field, 'mismatchV')} value={node.mismatchV} kind="voltage" label="Mismatch" fullLabel={`${owner} branch voltage mismatch`} optional placeholder="0 V" hint="Worst spread of the branch voltages." size="narrow" />
        ) : null}
      </View>
      {kind !== 'source' ? (
        <View style={styles.children}>
          {children.map((child, i) => (
            <View key={i} style={styles.child}>
              <CircuitNode field={at(at(field, listKey), i)} node={child} owner={`${owner} ${childNoun} ${i + 1}`} sourceIds={sourceIds} depth={depth + 1} />
              <RowActions
                noun={`${owner} ${childNoun} ${i + 1}`}
                index={i}
                count={children.length}
                keepOne
                onDelete={() => update<RawCircuit[]>(at(field, listKey), (list) => removeItem(list ?? [], i))}
              />
            </View>
          ))}
          {listError ? (
            <Text variant="caption" tone="danger" role="alert">
              {listError}
            </Text>
          ) : null}
          <Button
            label={`Add ${childNoun}`}
            variant="secondary"
            accessibilityLabel={`Add ${owner} ${childNoun}`}
            onPress={() => update<RawCircuit[]>(at(field, listKey), (list) => [...(list ?? []), { kind: 'source', source: first }])}
            style={styles.button}
          />
        </View>
      ) : null}
    </View>
  );
});

function Group({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.group}>
      <Text variant="label" tone="muted" style={styles.groupTitle}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  group: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  groupTitle: { textTransform: 'uppercase', letterSpacing: 0.6 },
  item: { gap: spacing.sm, paddingBottom: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
  node: { gap: spacing.sm },
  nested: { paddingLeft: spacing.md, borderLeftWidth: 2, borderLeftColor: color.border, borderRadius: radius.sm },
  children: { gap: spacing.sm },
  child: { gap: spacing.xs },
  threshold: { paddingTop: spacing.xs },
  button: { alignSelf: 'flex-start' },
});
