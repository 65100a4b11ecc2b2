import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import { heatCurvesModel } from '@/charts/heat-curves-model';
import { HeatCurvesPlot } from '@/charts/heat-curves-plot';
import { LineSwatch } from '@/charts/line-swatch';
import { plotFrame, tickCounts } from '@/charts/plot-frame';
import { extentIn } from '@/charts/series-sample';
import { temperatureDomain } from '@/charts/temperature-axis';
import { Text } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';

import { usePrinting } from '../use-printing';

/** Width of the chart on paper, px: an A4 page less its margins (see the print rules). */
export const PRINT_CHART_WIDTH = 680;
const HEIGHT = 300;

export type ReportCurvesProps = { result: StudyResult };

/** The heat curves of the whole run with their limits and peaks, drawn once (no zoom or cursor) for reading and print. */
export function ReportCurves({ result }: ReportCurvesProps) {
  const model = useMemo(() => heatCurvesModel(result), [result]);
  const printing = usePrinting();
  const [measured, setMeasured] = useState(0);
  const width = printing ? PRINT_CHART_WIDTH : measured;

  const frame = useMemo(() => {
    const view: [number, number] = [0, Math.max(result.durationS, Number.MIN_VALUE)];
    let low = Infinity;
    let high = -Infinity;
    for (const curve of model.curves) {
      const [a, b] = extentIn(curve.series, view[0], view[1]);
      low = Math.min(low, a);
      high = Math.max(high, b, curve.peak?.valueC ?? -Infinity);
    }
    for (const limit of model.limits) {
      low = Math.min(low, limit.valueC);
      high = Math.max(high, limit.valueC);
    }
    const provisional = plotFrame(width, HEIGHT, view, [0, 1]);
    return plotFrame(width, HEIGHT, view, temperatureDomain(low, high, tickCounts(provisional).y));
  }, [model, result.durationS, width]);

  if (model.curves.length === 0) return <Text tone="muted">This result holds no chart series.</Text>;

  return (
    <View testID="report-curves" style={styles.chart}>
      <View style={{ height: HEIGHT }} onLayout={(e: LayoutChangeEvent) => setMeasured(Math.round(e.nativeEvent.layout.width))}>
        {width > 0 ? (
          <HeatCurvesPlot
            frame={frame}
            curves={model.curves}
            limits={model.limits}
            tickCount={tickCounts(frame)}
            cursorS={null}
            selection={null}
            label={`Heat curves: ${model.curves.map((c) => c.label).join(', ')} against time`}
          />
        ) : null}
      </View>
      <View style={styles.legend}>
        {model.curves.map((curve) => (
          <View key={curve.key} style={styles.item}>
            <LineSwatch style={curve.style} />
            <Text variant="caption">{curve.label}</Text>
          </View>
        ))}
        {model.limits.map((limit) => (
          <View key={limit.key} style={styles.item}>
            <LineSwatch style={limit.style} width={18} />
            <Text variant="caption">{limit.label}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  chart: { gap: spacing.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
