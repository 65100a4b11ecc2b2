import { scaleLinear } from 'd3-scale';
import { curveStepAfter, line } from 'd3-shape';
import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui';
import { chartColor, color, fontFamily, spacing } from '@/constants/theme';

import { PLOT_MARGIN, tickCounts } from './plot-frame';
import { profileEnvelope } from './profile-envelope';
import { LABEL_SIZE } from './plot-labels';
import { timeTicks } from './time-axis';

/** One quantity held constant over stretches of time, in the chart's unit. */
export type ProfileChartSeries = { key: string; label: string; steps: readonly { startS: number; endS: number; value: number }[] };

export type ProfileChartProps = {
  series: readonly ProfileChartSeries[];
  /** Axis unit: "A" for load current, "W" for power per part. */
  unit: string;
  durationS: number;
  height?: number;
  label: string;
};

/** The load profile of one pass as step lines against time (a preview while editing). */
export function ProfileChart({ series, unit, durationS, height = 180, label }: ProfileChartProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));
  const frame = useMemo(() => {
    const left = PLOT_MARGIN.left;
    const top = PLOT_MARGIN.top;
    const right = Math.max(left + 1, width - PLOT_MARGIN.right);
    const bottom = Math.max(top + 1, height - PLOT_MARGIN.bottom);
    let max = 0;
    for (const s of series) for (const step of s.steps) max = Math.max(max, step.value);
    const x = scaleLinear().domain([0, Math.max(durationS, Number.MIN_VALUE)]).range([left, right]);
    const y = scaleLinear().domain([0, max > 0 ? max * 1.08 : 1]).range([bottom, top]).nice();
    return { left, top, right, bottom, x, y };
  }, [width, height, series, durationS]);

  const paths = useMemo(
    () =>
      series.map((s, i) => {
        const stroke = chartColor.devices[i % chartColor.devices.length];
        const step = line<number[]>()
          .x((p) => frame.x(p[0]))
          .y((p) => frame.y(p[1]))
          .curve(curveStepAfter);
        // More steps than pixels: one bucket per pixel, drawn as the band from its lowest to its
        // highest value, so every step's peak still shows.
        const buckets = Math.max(1, Math.floor(frame.right - frame.left));
        if (s.steps.length > buckets) {
          const env = profileEnvelope(s.steps, durationS, buckets);
          const top = env.flatMap((b) => [[b.startS, b.max], [b.endS, b.max]]);
          const bottom = env.flatMap((b) => [[b.startS, b.min], [b.endS, b.min]]).reverse();
          const linear = line<number[]>()
            .x((p) => frame.x(p[0]))
            .y((p) => frame.y(p[1]));
          return { key: s.key, label: s.label, d: linear(top) ?? '', band: `${linear([...top, ...bottom]) ?? ''}Z`, stroke };
        }
        // A step line needs a closing point at the end of the last step.
        const pts = s.steps.flatMap((st, k) => (k === s.steps.length - 1 ? [[st.startS, st.value], [st.endS, st.value]] : [[st.startS, st.value]]));
        return { key: s.key, label: s.label, d: step(pts) ?? '', band: null, stroke };
      }),
    [series, frame, durationS],
  );

  const counts = tickCounts(frame);
  const time = timeTicks(0, Math.max(durationS, Number.MIN_VALUE), counts.x);
  const yTicks = frame.y.ticks(Math.max(2, Math.min(5, counts.y)));
  const yFormat = frame.y.tickFormat(5);

  return (
    <View style={styles.box} onLayout={onLayout}>
      {width > 0 ? (
        <Svg width={width} height={height} role="img" aria-label={label}>
          {yTicks.map((v) => (
            <G key={`y${v}`}>
              <Line x1={frame.left} x2={frame.right} y1={frame.y(v)} y2={frame.y(v)} stroke={chartColor.grid} strokeWidth={1} />
              <SvgText x={frame.left - 6} y={frame.y(v) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {yFormat(v)}
              </SvgText>
            </G>
          ))}
          <SvgText x={frame.left - 6} y={frame.top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="end">
            {unit}
          </SvgText>
          {time.ticks.map((tick) => (
            <SvgText key={`x${tick.value}`} x={frame.x(tick.value)} y={frame.bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {tick.label}
            </SvgText>
          ))}
          <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
            {`Time (${time.unit.symbol})`}
          </SvgText>
          <Line x1={frame.left} x2={frame.right} y1={frame.bottom} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
          <Line x1={frame.left} x2={frame.left} y1={frame.top} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
          {paths.map((p) =>
            p.band ? <Path key={`band-${p.key}`} d={p.band} fill={p.stroke} fillOpacity={0.25} stroke="none" /> : null,
          )}
          {paths.map((p) => (
            <Path key={p.key} d={p.d} fill="none" stroke={p.stroke} strokeWidth={1.8} strokeLinejoin="round" />
          ))}
        </Svg>
      ) : null}
      {paths.length > 1 ? (
        <View style={styles.legend}>
          {paths.map((p) => (
            <View key={p.key} style={styles.item}>
              <View style={[styles.swatch, { backgroundColor: p.stroke }]} />
              <Text variant="caption" tone="muted">
                {p.label}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%', gap: spacing.xs },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  swatch: { width: 16, height: 3, borderRadius: 1.5 },
});
