import { line } from 'd3-shape';
import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, ClipPath, Defs, G, Path, Rect } from 'react-native-svg';

import { Text } from '@/components/ui';
import { chartColor, color, spacing } from '@/constants/theme';

import { ChartKey, markerColours, type ChartKeyItem } from './chart-key';
import type { LineStyle } from './heat-curves-model';
import { LogAxes } from './log-axes';
import { formatLogValue, formatTimeTick } from './log-axis';
import { logFrame, type LogFrame } from './log-frame';
import type { ZthPoint } from './zth-model';

export type ZthChartCurve = { label: string; points: readonly ZthPoint[] };

export type ZthChartProps = {
  /** Names the chart for screen readers. */
  label: string;
  /** Datasheet points, drawn as markers. */
  points?: readonly ZthPoint[];
  pointsLabel?: string;
  /** The fitted or model curve, a solid line. */
  curve?: ZthChartCurve;
  /** A curve to compare with (the model before a fit, say), dashed. */
  secondCurve?: ZthChartCurve;
  /** The time of a datasheet point to ring, such as where the fit is furthest off. */
  markTimeS?: number;
  markLabel?: string;
  height?: number;
};

export const ZTH_CURVE_STYLE: LineStyle = { stroke: chartColor.devices[0], width: 2 };
export const ZTH_SECOND_STYLE: LineStyle = { stroke: chartColor.devices[1], width: 1.5, dash: '6 3' };
const CLIP_ID = 'zth-chart-clip';

const drawable = (p: ZthPoint) => p.timeS > 0 && p.zthKPerW > 0 && Number.isFinite(p.timeS) && Number.isFinite(p.zthKPerW);

function pathOf(frame: LogFrame, points: readonly ZthPoint[]): string {
  return (
    line<ZthPoint>()
      .x((p) => frame.x(p.timeS))
      .y((p) => frame.y(p.zthKPerW))(points.filter(drawable)) ?? ''
  );
}

/** Transient thermal impedance Zth(t) on log-log axes: K/W against time. */
export function ZthChart({ label, points = [], pointsLabel = 'Datasheet points', curve, secondCurve, markTimeS, markLabel, height = 280 }: ZthChartProps) {
  const [width, setWidth] = useState(0);
  const all = useMemo(() => [...points, ...(curve?.points ?? []), ...(secondCurve?.points ?? [])].filter(drawable), [points, curve, secondCurve]);
  const frame = useMemo(
    () => logFrame(width, height, all.map((p) => p.timeS), all.map((p) => p.zthKPerW)),
    [width, height, all],
  );
  const marked = markTimeS === undefined ? undefined : points.find((p) => Math.abs(p.timeS - markTimeS) <= 1e-9 * markTimeS);

  const key: ChartKeyItem[] = [
    ...(curve ? [{ key: 'curve', label: curve.label, line: ZTH_CURVE_STYLE }] : []),
    ...(secondCurve ? [{ key: 'second', label: secondCurve.label, line: ZTH_SECOND_STYLE }] : []),
    ...(points.length ? [{ key: 'points', label: pointsLabel, marker: markerColours }] : []),
    ...(marked ? [{ key: 'mark', label: markLabel ?? 'Marked point', marker: { stroke: color.danger, fill: 'none' } }] : []),
  ];

  if (all.length === 0) return <Text tone="muted">No Zth values to draw.</Text>;

  return (
    <View style={styles.chart}>
      <View testID="zth-chart-area" style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
        {frame && width > 0 ? (
          <Svg width={width} height={height} role="img" aria-label={label}>
            <Defs>
              <ClipPath id={CLIP_ID}>
                <Rect x={frame.left} y={frame.top - 2} width={frame.right - frame.left} height={frame.bottom - frame.top + 4} />
              </ClipPath>
            </Defs>
            <LogAxes frame={frame} xTitle="Time" yTitle="Zth (K/W)" formatX={formatTimeTick} formatY={formatLogValue} />
            <G clipPath={`url(#${CLIP_ID})`}>
              {secondCurve ? (
                <Path d={pathOf(frame, secondCurve.points)} fill="none" stroke={ZTH_SECOND_STYLE.stroke} strokeWidth={ZTH_SECOND_STYLE.width} strokeDasharray={ZTH_SECOND_STYLE.dash} />
              ) : null}
              {curve ? <Path d={pathOf(frame, curve.points)} fill="none" stroke={ZTH_CURVE_STYLE.stroke} strokeWidth={ZTH_CURVE_STYLE.width} strokeLinejoin="round" /> : null}
            </G>
            {points.filter(drawable).map((p, i) => (
              <Circle key={`p${i}`} cx={frame.x(p.timeS)} cy={frame.y(p.zthKPerW)} r={3.5} stroke={markerColours.stroke} fill={markerColours.fill} strokeWidth={1.5} />
            ))}
            {marked ? <Circle cx={frame.x(marked.timeS)} cy={frame.y(marked.zthKPerW)} r={8} stroke={color.danger} fill="none" strokeWidth={1.5} /> : null}
          </Svg>
        ) : null}
      </View>
      <ChartKey items={key} />
    </View>
  );
}

const styles = StyleSheet.create({
  chart: { gap: spacing.sm },
});
