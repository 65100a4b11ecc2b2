import { StyleSheet, View } from 'react-native';

import { interpolateLogLog } from '@/core/study';
import { spacing } from '@/constants/theme';

import { useEditorActions } from '../editor-context';
import { at } from '../field-path';
import type { RawSink } from '../types';
import { ChoiceRow } from './choice-row';
import { PointList } from './point-list';
import { QuantityField } from './quantity-field';

type Air = 'fixed' | 'natural' | 'forced';

const AIR = [
  { value: 'fixed', label: 'Fixed Rθsa' },
  { value: 'natural', label: 'Natural convection' },
  { value: 'forced', label: 'Forced air' },
] as const;

const FORCED_COLUMNS = [
  { key: 'airSpeedMPerS', label: 'Air speed', kind: 'speed' },
  { key: 'rthKPerW', label: 'Rθsa', kind: 'thermalResistance' },
] as const;

const airOf = (sink: RawSink): Air => (sink.forcedAir ? 'forced' : sink.naturalConvection ? 'natural' : 'fixed');

/** Rθsa of a forced-air curve at its speed, when its values allow (to keep it when switching away). */
function forcedRth(sink: RawSink): number | '' {
  const fa = sink.forcedAir;
  const pts = fa?.points ?? [];
  if (typeof fa?.airSpeedMPerS !== 'number' || pts.length === 0 || !pts.every((p) => typeof p.airSpeedMPerS === 'number' && typeof p.rthKPerW === 'number')) return '';
  return Number(interpolateLogLog(pts.map((p) => ({ x: p.airSpeedMPerS as number, y: p.rthKPerW as number })), fa.airSpeedMPerS).toPrecision(4));
}

function switchAir(sink: RawSink, to: Air): RawSink {
  const next: RawSink = { ...sink };
  const from = airOf(sink);
  if (from === 'forced') next.rthKPerW = forcedRth(sink);
  delete next.forcedAir;
  if (to !== 'natural') delete next.naturalConvection;
  if (to === 'natural' && !next.naturalConvection) next.naturalConvection = { referenceRiseK: '' };
  if (to === 'forced') {
    next.forcedAir = { airSpeedMPerS: '', points: [{ airSpeedMPerS: '', rthKPerW: next.rthKPerW ?? '' }] };
    delete next.rthKPerW;
    delete next.naturalConvection;
  }
  return next;
}

export type SinkAirFieldsProps = { field: string; sink: RawSink; owner: string };

/** How the sink sheds heat: a fixed Rθsa, natural convection about a reference rise, or a forced-air curve. */
export function SinkAirFields({ field, sink, owner }: SinkAirFieldsProps) {
  const { set } = useEditorActions();
  const air = airOf(sink);
  return (
    <View style={styles.box}>
      <ChoiceRow label="Sink to air" value={air} options={AIR} onChange={(to) => to !== air && set(field, switchAir(sink, to))} />
      {air !== 'forced' ? (
        <View style={styles.row}>
          <QuantityField
            field={at(field, 'rthKPerW')}
            value={sink.rthKPerW}
            kind="thermalResistance"
            label="Rθsa"
            fullLabel={`${owner} Rθsa`}
            hint={air === 'natural' ? 'At the reference rise.' : undefined}
          />
          {air === 'natural' ? (
            <>
              <QuantityField
                field={at(at(field, 'naturalConvection'), 'referenceRiseK')}
                value={sink.naturalConvection?.referenceRiseK}
                kind="temperatureDifference"
                label="Reference rise"
                fullLabel={`${owner} reference rise`}
              />
              <QuantityField
                field={at(at(field, 'naturalConvection'), 'exponent')}
                value={sink.naturalConvection?.exponent}
                kind="number"
                label="Exponent"
                fullLabel={`${owner} convection exponent`}
                optional
                placeholder="0.25"
                hint="Rθsa ∝ (ΔTref/ΔT)^n; empty: 0.25 (laminar)."
              />
            </>
          ) : null}
        </View>
      ) : (
        <>
          <View style={styles.row}>
            <QuantityField
              field={at(at(field, 'forcedAir'), 'airSpeedMPerS')}
              value={sink.forcedAir?.airSpeedMPerS}
              kind="speed"
              label="Air speed"
              fullLabel={`${owner} air speed`}
              hint="Within the curve’s points."
            />
          </View>
          <PointList
            field={at(at(field, 'forcedAir'), 'points')}
            points={sink.forcedAir?.points}
            columns={FORCED_COLUMNS}
            noun="point"
            minRows={1}
            owner={`${owner} forced-air`}
            title="Rθsa against air speed (log–log between points)"
          />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
});
