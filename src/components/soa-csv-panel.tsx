import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, InlineAlert, LoadingState, Text } from '@/components/ui';
import { SoaChart } from '@/charts/soa-chart';
import { color, radius, spacing } from '@/constants/theme';
import { FilePicker } from '@/features/catalogues/components/file-picker';
import type { PickedFile } from '@/features/catalogues/types';
import { formatQuantity } from '@/features/studies/quantity-format';

import { partSoaChart } from '@/charts/soa-boundaries';
import { useSoaPointsCsv } from '@/features/parts/api';
import { ValueTable } from '@/features/parts/components/value-table';
import { formatPulse } from '@/features/parts/part-format';
import type { SoaCurveJson, TransistorKind } from '@/features/parts/types';

export type SoaCsvPanelProps = {
  transistor: TransistorKind;
  /** Tj,max the thermal lines derate from (the part's, when the SOA has none yet). */
  tjMaxC: number | null;
  onUse: (curves: SoaCurveJson[]) => void;
};

/** Datasheet SOA points from a CSV (Vce, Ic and pulse columns), grouped into curves on the server; nothing is saved. */
export function SoaCsvPanel({ transistor, tjMaxC, onUse }: SoaCsvPanelProps) {
  const read = useSoaPointsCsv();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [curves, setCurves] = useState<SoaCurveJson[] | null>(null);
  const [used, setUsed] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const pick = async (picked: PickedFile) => {
    setError(null);
    setUsed(false);
    try {
      setCurves(await read.mutateAsync(picked));
      setFile(picked);
    } catch (e) {
      setCurves(null);
      setError(errorMessage(e));
    }
  };

  const chart = useMemo(
    () => (curves && tjMaxC !== null ? partSoaChart({ kind: 'points', transistor, tjMaxC, curves }) : null),
    [curves, transistor, tjMaxC],
  );

  return (
    <View style={styles.panel} testID="soa-csv-panel">
      <Text variant="bodyStrong">SOA points from CSV</Text>
      <Text variant="caption" tone="muted">
        A CSV file with Vce, Ic and pulse columns read off the datasheet’s SOA chart at a 25 °C case; the pulse is “dc” or a width such as
        “1ms”. Each pulse width becomes one curve.
      </Text>
      <View style={styles.row}>
        <FilePicker label={file ? 'Choose another SOA file' : 'SOA points from CSV'} onPick={pick} disabled={read.isPending} />
      </View>
      {read.isPending ? <LoadingState label="Reading the file…" /> : null}
      {error ? <InlineAlert message={`The file could not be read: ${error}`} /> : null}
      {curves ? (
        <View style={styles.result}>
          <ValueTable
            label="SOA curves read from the file"
            testID="soa-csv-curves"
            columns={['', 'Pulse', 'Points', 'Vce range']}
            rows={curves.map((c, i) => [
              String(i + 1),
              formatPulse(c.pulseS),
              String(c.points.length),
              c.points.length ? `${formatQuantity(c.points[0].vceV, 'V')} – ${formatQuantity(c.points[c.points.length - 1].vceV, 'V')}` : '—',
            ])}
          />
          {chart?.error ? <InlineAlert message={`These curves do not make an SOA model: ${chart.error}`} /> : null}
          {chart && chart.error === null ? <SoaChart boundaries={chart.boundaries} label={`SOA curves from ${file?.name ?? 'the file'}`} height={280} /> : null}
          {tjMaxC === null ? <Text tone="muted">Enter Tj,max to draw the curves.</Text> : null}
          {used ? (
            <Text role="status" style={styles.used}>
              The SOA model now holds these {curves.length} curves; save the part to keep them.
            </Text>
          ) : (
            <Button
              label="Use these curves"
              style={styles.use}
              disabled={!chart || chart.error !== null}
              onPress={() => {
                onUse(curves);
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
  use: { alignSelf: 'flex-start' },
  used: { color: color.success },
});
