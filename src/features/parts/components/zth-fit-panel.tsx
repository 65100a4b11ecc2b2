import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, InlineAlert, LoadingState, Text } from '@/components/ui';
import { ZthChart } from '@/charts/zth-chart';
import { zthCurve, zthEquivalent, zthTimeSpan, type ZthPoint } from '@/charts/zth-model';
import { color, radius, spacing } from '@/constants/theme';
import { FilePicker } from '@/features/catalogues/components/file-picker';
import type { PickedFile } from '@/features/catalogues/types';
import { formatNumber } from '@/features/studies/quantity-format';

import { useFitZth } from '../api';
import { formatPercent, formatTime } from '../part-format';
import type { ZthFitResponse } from '../types';
import { ChoiceChips } from './choice-chips';
import { ValueTable } from './value-table';

export type ZthFitPanelProps = {
  /** The model as entered, drawn dashed for comparison. */
  current: ZthPoint[] | null;
  onUse: (fit: ZthFitResponse) => void;
};

const PER_DECADE = [
  { value: '2', label: '2' },
  { value: '3', label: '3' },
  { value: '4', label: '4' },
] as const;

/**
 * Datasheet Zth(t) points from a CSV, fitted to a Foster set on the server (nothing is saved):
 * the points, the fitted curve and its residual, then "Use these terms" fills the model.
 */
export function ZthFitPanel({ current, onUse }: ZthFitPanelProps) {
  const fit = useFitZth();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [perDecade, setPerDecade] = useState<'2' | '3' | '4'>('4');
  const [result, setResult] = useState<ZthFitResponse | null>(null);
  const [used, setUsed] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const run = async (picked: PickedFile, per: string) => {
    setError(null);
    setUsed(false);
    try {
      setResult(await fit.mutateAsync({ file: picked, perDecade: Number(per) }));
      setFile(picked);
    } catch (e) {
      setResult(null);
      setError(errorMessage(e));
    }
  };

  const fitted = useMemo(() => {
    if (!result || result.fit.terms.length === 0) return null;
    const eq = zthEquivalent({ kind: 'foster', terms: result.fit.terms });
    return zthCurve(eq, zthTimeSpan(eq, result.points));
  }, [result]);

  return (
    <View style={styles.panel} testID="zth-fit-panel">
      <Text variant="bodyStrong">Fit Zth from CSV</Text>
      <Text variant="caption" tone="muted">
        A CSV file with a time and a Zth column, units in the header (for example “t (ms)” and “Zth (°C/W)”), read off the datasheet’s
        single-pulse curve. The server fits a Foster set with time constants on a log grid; nothing is saved until you use the terms and
        save the part.
      </Text>
      <View style={styles.row}>
        <FilePicker label={file ? 'Choose another Zth file' : 'Fit Zth from CSV'} onPick={(f) => run(f, perDecade)} disabled={fit.isPending} />
      </View>
      {fit.isPending ? <LoadingState label="Fitting…" /> : null}
      {error ? <InlineAlert message={`The file could not be fitted: ${error}`} /> : null}
      {result ? (
        <View style={styles.result}>
          <Text variant="caption" tone="muted">
            {file?.name} · {result.points.length} points from {formatTime(Math.min(...result.points.map((p) => p.timeS)))} to{' '}
            {formatTime(Math.max(...result.points.map((p) => p.timeS)))}
          </Text>
          <ZthChart
            label={`Zth fit: ${result.points.length} datasheet points and the fitted curve`}
            points={result.points}
            curve={fitted ? { label: 'Fitted Foster set', points: fitted } : undefined}
            secondCurve={current ? { label: 'Model as entered', points: current } : undefined}
            markTimeS={result.fit.maxErrorTimeS}
            markLabel="Largest error"
            height={260}
          />
          <Text testID="zth-fit-residual">
            Residual: rms {formatPercent(result.fit.rmsRelativeError)}, largest {formatPercent(result.fit.maxRelativeError)} at{' '}
            {formatTime(result.fit.maxErrorTimeS)}
          </Text>
          {result.fit.warning ? <InlineAlert tone="info" message={result.fit.warning} /> : null}
          <View style={styles.table}>
            <ValueTable
              label="Fitted Foster terms"
              columns={['', 'R (K/W)', 'τ']}
              rows={result.fit.terms.map((t, i) => [String(i + 1), formatNumber(t.rKPerW), formatTime(t.tauS)])}
            />
          </View>
          <ChoiceChips
            label="Time constants per decade"
            value={perDecade}
            options={PER_DECADE}
            onChange={(per) => {
              setPerDecade(per);
              if (file) void run(file, per);
            }}
          />
          {used ? (
            <Text role="status" style={styles.used}>
              The model now holds these {result.fit.terms.length} terms and the {result.points.length} points; save the part to keep them.
            </Text>
          ) : (
            <Button
              label="Use these terms"
              style={styles.use}
              disabled={result.fit.terms.length === 0}
              onPress={() => {
                onUse(result);
                setUsed(true);
              }}
            />
          )}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.sm, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.borderStrong, backgroundColor: color.surface },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  result: { gap: spacing.sm },
  table: { maxWidth: 520 },
  use: { alignSelf: 'flex-start' },
  used: { color: color.success },
});
