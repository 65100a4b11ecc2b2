import { useMemo, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { ZthChart } from '@/charts/zth-chart';
import { zthCurve, zthEquivalent, zthTimeSpan, type ThermalModel, type ZthPoint } from '@/charts/zth-model';
import { spacing } from '@/constants/theme';
import { fosterToCauer } from '@/core/thermal';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { formatPercent, formatTime, rthJcKPerW, thermalLabel } from '../part-format';
import type { ZthFit } from '../types';
import { ValueTable } from './value-table';

export type ThermalModelViewProps = { model: ThermalModel; zthPoints: ZthPoint[] | null; zthFit: ZthFit | null };

const r = (v: number) => formatNumber(v);

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.block}>
      <Text variant="label" tone="muted">
        {title}
      </Text>
      {children}
    </View>
  );
}

/** Why the ladder is shown beside a Foster set (PHYSICS.md §3). */
export const FOSTER_NOTE =
  'A Foster set holds only with the case at a fixed temperature, so a study converts it to the Cauer ladder (same Zth(t)) before chaining it to the interface and sink.';

/** The junction-to-case model as a table, its other form beside it, and its Zth(t) curve. */
export function ThermalModelView({ model, zthPoints, zthFit }: ThermalModelViewProps) {
  const wide = useIsWide();
  const eq = useMemo(() => zthEquivalent(model), [model]);
  const points = useMemo(() => zthPoints ?? [], [zthPoints]);
  const curve = useMemo(() => zthCurve(eq, zthTimeSpan(eq, points)), [eq, points]);
  const ladder = useMemo(() => (model.kind === 'foster' ? fosterToCauer(model.terms) : null), [model]);

  let tables;
  if (model.kind === 'foster') {
    tables = (
      <View style={[styles.tables, wide && styles.tablesWide]}>
        <Block title="Foster terms">
          <ValueTable
            label="Foster terms"
            columns={['', 'R (K/W)', 'τ']}
            rows={[...model.terms].sort((a, b) => a.tauS - b.tauS).map((t, i) => [String(i + 1), r(t.rKPerW), formatTime(t.tauS)])}
          />
        </Block>
        <Block title="Equivalent Cauer ladder, junction first">
          <ValueTable
            label="Equivalent Cauer ladder"
            testID="cauer-ladder"
            columns={['', 'R (K/W)', 'C (J/K)']}
            rows={(ladder ?? []).map((s, i) => [String(i + 1), r(s.rKPerW), r(s.capacityJPerK)])}
          />
        </Block>
      </View>
    );
  } else if (model.kind === 'cauer') {
    tables = (
      <View style={[styles.tables, wide && styles.tablesWide]}>
        <Block title="Cauer stages, junction first">
          <ValueTable label="Cauer stages" columns={['', 'R (K/W)', 'C (J/K)']} rows={model.stages.map((s, i) => [String(i + 1), r(s.rKPerW), r(s.capacityJPerK)])} />
        </Block>
        <Block title="Equivalent Foster terms">
          <ValueTable
            label="Equivalent Foster terms"
            columns={['', 'R (K/W)', 'τ']}
            rows={[
              ...eq.terms.map((t, i) => [String(i + 1), r(t.rKPerW), formatTime(t.tauS)]),
              ...(eq.instantKPerW > 0 ? [['', r(eq.instantKPerW), 'at once']] : []),
            ]}
          />
        </Block>
      </View>
    );
  } else {
    tables = (
      <Text>
        Rθjc {formatQuantity(model.rthKPerW, 'K/W')}
        {(model.capacityJPerK ?? 0) > 0 ? `, ${formatQuantity(model.capacityJPerK ?? 0, 'J/K')} at the junction (τ ${formatTime(model.rthKPerW * (model.capacityJPerK ?? 0))})` : ', no heat capacity: the junction follows the power at once'}
      </Text>
    );
  }

  return (
    <View style={styles.view}>
      <Text tone="muted">
        {thermalLabel(model)} · Rθjc {formatQuantity(rthJcKPerW(model), 'K/W')}
      </Text>
      {tables}
      {model.kind === 'foster' ? (
        <Text variant="caption" tone="muted" testID="foster-note">
          {FOSTER_NOTE}
        </Text>
      ) : null}
      <ZthChart
        label={`Zth(t) of the ${thermalLabel(model)} model${points.length ? ` with ${points.length} datasheet points` : ''}`}
        curve={{ label: zthFit ? 'Fitted model' : 'Model', points: curve }}
        points={points}
        markTimeS={zthFit?.maxErrorTimeS}
        markLabel="Largest fit error"
        height={wide ? 320 : 260}
      />
      {zthFit ? (
        <Text variant="caption" tone="muted">
          Fitted to {points.length} datasheet points: rms error {formatPercent(zthFit.rmsRelativeError)}, largest {formatPercent(zthFit.maxRelativeError)} at{' '}
          {formatTime(zthFit.maxErrorTimeS)}.{zthFit.warning ? ` ${zthFit.warning}` : ''}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: spacing.md },
  tables: { gap: spacing.md },
  tablesWide: { flexDirection: 'row', alignItems: 'flex-start' },
  block: { flex: 1, gap: spacing.xs },
});
