import { memo, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { partSoaChart } from '@/charts/soa-boundaries';
import { SoaChart } from '@/charts/soa-chart';
import { SoaCsvPanel } from '@/components/soa-csv-panel';
import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import type { SoaJson } from '@/features/parts/types';

import { useEditorActions, useErrorsUnder, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { moveItem, removeItem } from '../list-edits';
import { soaKindChange, starterSoa, transistorOf, type RawSoa } from '../soa-edits';
import type { RawDevice, RawObject, RawPoint } from '../types';
import { ChoiceRow } from './choice-row';
import { PointList } from './point-list';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';

const GIVEN_AS = [
  { value: 'parameters', label: 'Parameters' },
  { value: 'points', label: 'Datasheet points' },
] as const;

const TRANSISTORS = [
  { value: 'bipolar', label: 'Bipolar' },
  { value: 'darlington', label: 'Darlington' },
  { value: 'mosfet', label: 'MOSFET' },
] as const;

const LINEAR = [
  { value: 'none', label: 'Not given' },
  { value: 'dc', label: 'DC rated' },
  { value: 'not-dc', label: 'DC not rated' },
] as const;

const BOUNDARY = [
  { key: 'vceV', label: 'Vce', kind: 'voltage' },
  { key: 'icA', label: 'Ic', kind: 'current' },
] as const;
const ZTH = [
  { key: 'rKPerW', label: 'R', kind: 'thermalResistance' },
  { key: 'tauS', label: 'τ', kind: 'time' },
] as const;
const SB_PULSES = [
  { key: 'pulseS', label: 'Pulse', kind: 'time' },
  { key: 'referenceIcA', label: 'I0', kind: 'current' },
] as const;
const DERATING_POINTS = [
  { key: 'caseC', label: 'Case', kind: 'temperature' },
  { key: 'factor', label: 'Factor', kind: 'number' },
] as const;

/** Field paths the fields below show their own problems at; the rest are listed under the model. */
const SHOWN = /\.(kind|transistor|tjMaxC|icMaxA|icPulseMaxA|vceoV|rthJcKPerW|referenceVceV|referenceIcA|exponent|fractionPerK|vceV|icA|pulseS|rKPerW|tauS|caseC|factor|longestRatedPulseS|points|curves|zthJc)$/;

export type SoaFieldsProps = { field: string; device: RawDevice; owner: string };

/**
 * A device's SOA model (docs/study-format.md, `soa`): Ic,max, Vceo, the thermal line's
 * Rθjc and Tj,max, second breakdown with its derating; or datasheet boundary points per pulse
 * width. The boundary chart follows the fields as they are typed.
 */
export const SoaFields = memo(function SoaFields({ field, device, owner }: SoaFieldsProps) {
  const { set, update } = useEditorActions();
  const soa = device.soa as RawSoa | undefined;
  const errors = useErrorsUnder(field);
  const transistorError = useFieldError(at(field, 'transistor'));
  const chart = useMemo(() => (soa ? partSoaChart(soa as unknown as SoaJson) : null), [soa]);
  if (!soa) {
    return (
      <View style={styles.box}>
        <Text tone="muted">No SOA model: the operating points are not checked against a safe operating area.</Text>
        <View style={styles.row}>
          <Button label="Add SOA from parameters" variant="secondary" accessibilityLabel={`Add ${owner} SOA from parameters`} onPress={() => set(field, starterSoa(device, 'parameters'))} />
          <Button label="Add SOA from datasheet points" variant="secondary" accessibilityLabel={`Add ${owner} SOA from datasheet points`} onPress={() => set(field, starterSoa(device, 'points'))} />
        </View>
        <Text variant="caption" tone="faint">
          Or copy a part with an SOA from the parts library.
        </Text>
      </View>
    );
  }
  const kind = soa.kind === 'points' ? 'points' : 'parameters';
  const sb = soa.secondBreakdown as (RawObject & { derating?: RawObject & { points?: RawPoint[] }; pulses?: RawPoint[] }) | undefined;
  const linear = soa.linearMode as (RawObject & { dcRated?: boolean }) | undefined;
  const curves = (Array.isArray(soa.curves) ? soa.curves : []) as (RawObject & { pulseS?: unknown; points?: RawPoint[] })[];
  const others = errors.filter((e) => !SHOWN.test(e.field));
  const sbField = at(field, 'secondBreakdown');
  const tj = typeof soa.tjMaxC === 'number' ? soa.tjMaxC : null;

  return (
    <View style={styles.box}>
      <ChoiceRow label="Given as" value={kind} options={GIVEN_AS} onChange={(k) => update<RawSoa>(field, (s) => soaKindChange(s, k))} />
      <ChoiceRow label="Transistor" value={transistorOf(soa.transistor)} options={TRANSISTORS} onChange={(t) => set(at(field, 'transistor'), t)} error={transistorError} />
      <View style={styles.row}>
        <QuantityField field={at(field, 'tjMaxC')} value={soa.tjMaxC} kind="temperature" label="Tj,max of the thermal line" fullLabel={`${owner} SOA Tj,max`} />
      </View>
      {kind === 'parameters' ? (
        <>
          <View style={styles.row}>
            <QuantityField field={at(field, 'icMaxA')} value={soa.icMaxA} kind="current" label="Ic,max" fullLabel={`${owner} Ic,max`} size="narrow" />
            <QuantityField field={at(field, 'icPulseMaxA')} value={soa.icPulseMaxA} kind="current" label="Peak pulse Ic" fullLabel={`${owner} peak pulse current`} optional size="narrow" />
            <QuantityField field={at(field, 'vceoV')} value={soa.vceoV} kind="voltage" label="Vceo" fullLabel={`${owner} Vceo`} size="narrow" />
            <QuantityField field={at(field, 'rthJcKPerW')} value={soa.rthJcKPerW} kind="thermalResistance" label="Rθjc" fullLabel={`${owner} SOA Rθjc`} hint="Of the thermal line Ic = (Tj,max − Tc)/(Rθjc·Vce)." size="narrow" />
          </View>
          <View style={styles.group}>
            <Text variant="label" tone="muted">
              Second breakdown: Is/b = I0 (Vce / V0)^(−n)
            </Text>
            {sb ? (
              <>
                <View style={styles.row}>
                  <QuantityField field={at(sbField, 'referenceVceV')} value={sb.referenceVceV} kind="voltage" label="V0" fullLabel={`${owner} second breakdown V0`} size="narrow" />
                  <QuantityField field={at(sbField, 'referenceIcA')} value={sb.referenceIcA} kind="current" label="I0 at V0" fullLabel={`${owner} second breakdown I0`} size="narrow" />
                  <QuantityField field={at(sbField, 'exponent')} value={sb.exponent} kind="number" label="Exponent n" fullLabel={`${owner} second breakdown exponent`} hint="Above 1; about 1.5–4." size="narrow" />
                </View>
                <Derating field={at(sbField, 'derating')} derating={sb.derating} owner={`${owner} second breakdown`} />
                <PointList field={at(sbField, 'pulses')} points={sb.pulses} columns={SB_PULSES} noun="pulse line" owner={`${owner} second breakdown`} title="Pulse lines (I0 at V0 for a pulse width)" />
                <Button label="Remove second breakdown" variant="ghost" accessibilityLabel={`Remove ${owner} second breakdown`} onPress={() => set(sbField, undefined)} style={styles.button} />
              </>
            ) : (
              <Button
                label="Add second breakdown"
                variant="secondary"
                accessibilityLabel={`Add ${owner} second breakdown`}
                onPress={() => set(sbField, { referenceVceV: '', referenceIcA: '', exponent: '', derating: { kind: 'linear', fractionPerK: '' } })}
                style={styles.button}
              />
            )}
          </View>
        </>
      ) : (
        <View style={styles.group}>
          <Text variant="label" tone="muted">
            Boundary per pulse width at a 25 °C case: Vce rising, Ic not rising; the last Vce is the voltage limit
          </Text>
          {curves.map((curve, i) => {
            const p = at(at(field, 'curves'), i);
            const dc = curve.pulseS === 'dc';
            const name = `${owner} curve ${i + 1}`;
            return (
              <View key={i} style={styles.curve} testID={`soa-curve-${i}`}>
                <View style={styles.head}>
                  <ChoiceRow label={`Curve ${i + 1}`} value={dc ? 'dc' : 'pulse'} options={[{ value: 'dc', label: 'DC' }, { value: 'pulse', label: 'Pulse' }]} onChange={(v) => set(at(p, 'pulseS'), v === 'dc' ? 'dc' : '')} />
                  <RowActions
                    noun={name}
                    index={i}
                    count={curves.length}
                    keepOne
                    onMove={(by) => update<unknown[]>(at(field, 'curves'), (list) => moveItem(list ?? [], i, by))}
                    onDelete={() => update<unknown[]>(at(field, 'curves'), (list) => removeItem(list ?? [], i))}
                  />
                </View>
                {dc ? null : (
                  <View style={styles.row}>
                    <QuantityField field={at(p, 'pulseS')} value={curve.pulseS} kind="time" label="Pulse width" fullLabel={`${name} pulse width`} size="narrow" />
                  </View>
                )}
                <PointList field={at(p, 'points')} points={curve.points} columns={BOUNDARY} noun="point" owner={name} minRows={1} />
              </View>
            );
          })}
          <Button
            label="Add curve"
            variant="secondary"
            accessibilityLabel={`Add ${owner} SOA curve`}
            onPress={() => update<unknown[]>(at(field, 'curves'), (list) => [...(list ?? []), { pulseS: '', points: [{ vceV: '', icA: '' }] }])}
            style={styles.button}
          />
          {soa.secondBreakdownDerating ? (
            <Derating field={at(field, 'secondBreakdownDerating')} derating={soa.secondBreakdownDerating as RawObject} owner={`${owner} steep segments`} onRemove={() => set(at(field, 'secondBreakdownDerating'), undefined)} />
          ) : (
            <Button
              label="Derate the steep segments on their own"
              variant="ghost"
              accessibilityLabel={`Add ${owner} steep-segment derating`}
              onPress={() => set(at(field, 'secondBreakdownDerating'), { kind: 'linear', fractionPerK: '' })}
              style={styles.button}
            />
          )}
          <SoaCsvPanel
            transistor={transistorOf(soa.transistor)}
            tjMaxC={tj}
            onUse={(read) => update<RawSoa>(field, (s) => ({ ...soaKindChange(s, 'points'), curves: read }))}
          />
        </View>
      )}

      <View style={styles.group}>
        <Text variant="label" tone="muted">
          Zθjc for pulses (Foster terms)
        </Text>
        {Array.isArray(soa.zthJc) ? (
          <>
            <PointList field={at(field, 'zthJc')} points={soa.zthJc as RawPoint[]} columns={ZTH} noun="term" owner={`${owner} Zθjc`} minRows={1} />
            <Button label="Treat every stretch as DC" variant="ghost" accessibilityLabel={`Remove ${owner} Zθjc`} onPress={() => set(at(field, 'zthJc'), undefined)} style={styles.button} />
          </>
        ) : (
          <>
            <Text variant="caption" tone="faint">
              Without it every stretch counts as DC (conservative).
            </Text>
            <Button
              label={device.package?.kind === 'foster' ? 'Use the package’s Foster terms' : 'Add Zθjc terms'}
              variant="secondary"
              accessibilityLabel={`Add ${owner} Zθjc`}
              onPress={() => set(at(field, 'zthJc'), device.package?.kind === 'foster' && Array.isArray(device.package.terms) ? JSON.parse(JSON.stringify(device.package.terms)) : [{ rKPerW: '', tauS: '' }])}
              style={styles.button}
            />
          </>
        )}
      </View>

      {transistorOf(soa.transistor) === 'mosfet' ? (
        <View style={styles.group}>
          <ChoiceRow
            label="Linear-mode rating"
            value={linear ? (linear.dcRated ? 'dc' : 'not-dc') : 'none'}
            options={LINEAR}
            onChange={(v) => set(at(field, 'linearMode'), v === 'none' ? undefined : v === 'dc' ? { dcRated: true } : { dcRated: false })}
          />
          {linear && !linear.dcRated ? (
            <View style={styles.row}>
              <QuantityField field={at(at(field, 'linearMode'), 'longestRatedPulseS')} value={linear.longestRatedPulseS} kind="time" label="Longest rated pulse" fullLabel={`${owner} longest linear-mode pulse`} optional />
            </View>
          ) : null}
        </View>
      ) : null}

      {chart && chart.error === null ? (
        <SoaChart boundaries={chart.boundaries} label={`${owner} SOA boundaries as entered`} height={240} />
      ) : (
        <Text variant="caption" tone="faint">
          {chart?.error ? `No boundary chart yet: ${chart.error.replace(/^soa\./, '')}` : 'The boundary chart appears once every value reads as a number.'}
        </Text>
      )}
      {others.map((e) => (
        <Text key={e.field} variant="caption" tone="danger" role="alert">
          {e.field.replace(`${field}.`, 'SOA ')}: {e.reason}
        </Text>
      ))}
      <Button label="Remove SOA model" variant="ghost" accessibilityLabel={`Remove ${owner} SOA model`} onPress={() => set(field, undefined)} style={styles.button} />
    </View>
  );
});

type DeratingProps = { field: string; derating: (RawObject & { points?: RawPoint[] }) | undefined; owner: string; onRemove?: () => void };

/** A derating: linear (fraction of the 25 °C current lost per K) or case-temperature points. */
function Derating({ field, derating, owner, onRemove }: DeratingProps) {
  const { set } = useEditorActions();
  const kind = derating?.kind === 'points' ? 'points' : 'linear';
  return (
    <View style={styles.group}>
      <ChoiceRow
        label={`Derating of ${owner.replace(/^\S+ /, '')}`}
        value={kind}
        options={[
          { value: 'linear', label: 'Linear' },
          { value: 'points', label: 'Points' },
        ]}
        onChange={(k) => set(field, k === 'linear' ? { kind: 'linear', fractionPerK: '' } : { kind: 'points', points: [{ caseC: 25, factor: 1 }, { caseC: '', factor: '' }] })}
      />
      {kind === 'linear' ? (
        <View style={styles.row}>
          <QuantityField field={at(field, 'fractionPerK')} value={derating?.fractionPerK} kind="number" label="Fraction per K" fullLabel={`${owner} derating per K`} hint="Of the 25 °C current lost per K above 25 °C: 0.005 is 0.5 %/K." />
        </View>
      ) : (
        <PointList field={at(field, 'points')} points={derating?.points} columns={DERATING_POINTS} noun="point" owner={`${owner} derating`} minRows={1} title="Factor against case temperature, rising" />
      )}
      {onRemove ? <Button label="Remove this derating" variant="ghost" accessibilityLabel={`Remove ${owner} derating`} onPress={onRemove} style={styles.button} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.sm },
  group: { gap: spacing.sm, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: color.border },
  curve: { gap: spacing.sm, paddingBottom: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  button: { alignSelf: 'flex-start' },
});
