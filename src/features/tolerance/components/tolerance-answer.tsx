import { StyleSheet, View } from 'react-native';

import { ToleranceHistogram } from '@/charts/tolerance-histogram';
import { Text, useIsWide } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import type { DeviceSpread, ToleranceResult } from '@/core/tolerance';
import { ResultTable, type ResultColumn } from '@/features/results/components/result-table';

import type { SweepPlace } from '../use-tolerance-sweep';
import { celsius, headline, METHOD_TEXT, probabilityText } from '../tolerance-text';
import { SensitivityBars } from './sensitivity-bars';

export type ToleranceAnswerProps = { result: ToleranceResult; place: SweepPlace; seconds: number };

const COLUMNS: ResultColumn<DeviceSpread>[] = [
  { label: 'Device', cell: (d) => ({ text: d.id, note: `target ${celsius(d.targetC)}, Tj,max ${celsius(d.tjMaxC)}` }) },
  { label: 'Nominal', cell: (d) => ({ text: celsius(d.nominalC) }) },
  { label: 'Mean ± sd', cell: (d) => ({ text: `${celsius(d.meanC)} ± ${Number(d.sdK.toFixed(1))} K` }) },
  { label: 'p5 · p50 · p95', cell: (d) => ({ text: `${d.percentiles.p5.toFixed(1)} · ${d.percentiles.p50.toFixed(1)} · ${d.percentiles.p95.toFixed(1)} °C` }) },
  { label: 'p99 · highest', cell: (d) => ({ text: `${d.percentiles.p99.toFixed(1)} · ${celsius(d.maxC)}`, tone: d.maxC > d.targetC ? 'danger' : 'default' }) },
  { label: 'Over target', cell: (d) => ({ text: probabilityText(d.exceedTarget), tone: d.exceedTarget.count > 0 ? 'danger' : 'default' }) },
  { label: 'Over Tj,max', cell: (d) => ({ text: probabilityText(d.exceedMax), tone: d.exceedMax.count > 0 ? 'danger' : 'default' }) },
];

/** What a sweep found: the answer in words, the histogram, the spread per device, the ranking of inputs. */
export function ToleranceAnswer({ result, place, seconds }: ToleranceAnswerProps) {
  const wide = useIsWide();
  const focus = result.devices.find((d) => d.id === result.focus)!;
  const passes = result.anyExceedTarget.count === 0;
  return (
    <View style={styles.answer} testID="tolerance-answer">
      <View style={[styles.box, passes ? styles.pass : styles.fail]}>
        <Text variant="bodyStrong" style={passes ? styles.passText : styles.failText}>
          {headline(result)}
        </Text>
        <Text tone="muted">{`Over Tj,max: ${probabilityText(result.anyExceedMax)} of ${result.mode === 'corners' ? 'corners' : 'runs'}.`}</Text>
      </View>
      <Text variant="caption" tone="muted">
        {`${result.runs.toLocaleString('en')} ${result.mode === 'corners' ? 'corners' : `runs, seed ${result.seed}`}, solved ${place === 'browser' ? 'in this browser' : 'on the server'} in ${seconds.toFixed(1)} s. Varied: ${result.inputs.map((i) => i.label).join(', ') || 'nothing'}.`}
      </Text>
      {result.skipped.map((s) => (
        <Text key={s.key} variant="caption" tone="faint">{`${s.label} left out: ${s.reason}.`}</Text>
      ))}
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={styles.column}>
          <Text variant="label" tone="muted">{`Peak junction of ${focus.id} (least nominal margin)`}</Text>
          <ToleranceHistogram
            edgesC={result.histogram.edgesC}
            counts={result.histogram.counts}
            targetC={focus.targetC}
            tjMaxC={focus.tjMaxC}
            label={`Histogram of the peak junction temperature of ${focus.id} over ${result.runs} runs, with its target ${celsius(focus.targetC)} and Tj,max ${celsius(focus.tjMaxC)}`}
            height={wide ? 240 : 200}
          />
        </View>
        <View style={styles.column}>
          <Text variant="label" tone="muted">
            What drives the spread
          </Text>
          <SensitivityBars ranking={result.sensitivity.ranking} method={result.sensitivity.method} />
          <Text variant="caption" tone="faint">
            {METHOD_TEXT[result.sensitivity.method]}
          </Text>
        </View>
      </View>
      <ResultTable label="Peak junction spread per device" rows={result.devices} rowKey={(d) => d.id} columns={COLUMNS} />
      {result.notes.map((n) => (
        <Text key={n} variant="caption" tone="muted">{`• ${n}`}</Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  answer: { gap: spacing.md },
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderLeftWidth: 4 },
  pass: { backgroundColor: color.successSoft, borderLeftColor: color.success },
  fail: { backgroundColor: color.dangerSoft, borderLeftColor: color.danger },
  passText: { color: color.success },
  failText: { color: color.danger },
  columns: { gap: spacing.lg },
  columnsWide: { flexDirection: 'row' },
  column: { flex: 1, gap: spacing.sm, minWidth: 0 },
});
