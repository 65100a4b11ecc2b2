import { line } from 'd3-shape';
import { memo, useMemo, useState } from 'react';
import { Platform, StyleSheet, View, type LayoutChangeEvent, type PointerEvent, type ViewStyle } from 'react-native';
import Svg, { Circle, ClipPath, Defs, G, Path, Rect, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui';
import { color, fontFamily, spacing } from '@/constants/theme';

import { ChartKey, markerColours, type ChartKeyItem } from './chart-key';
import { LogAxes } from './log-axes';
import { formatLogValue, formatReading } from './log-axis';
import { logFrame, type LogFrame } from './log-frame';
import {
  boundaryCurrentAt,
  boundaryStyle,
  LIMIT_LABEL,
  mostOccurrences,
  nearestPoint,
  pointRadii,
  segmentLabels,
  SOA_LABEL_SIZE,
  type SoaChartBoundary,
  type SoaChartPoint,
  type SoaChartPointValue,
} from './soa-chart-model';

export type { SoaChartBoundary, SoaChartPoint, SoaChartSegment } from './soa-chart-model';

export type SoaPick = SoaChartPointValue & {
  /** The operating point tapped, when the tap landed on one. */
  index?: number;
};

export type SoaChartProps = {
  /** Boundary curves, the first drawn strongest (e.g. DC at 25 °C, then derated, then pulses). */
  boundaries: readonly SoaChartBoundary[];
  points?: readonly SoaChartPoint[];
  /** A tap or click on the plot: the operating point under it, or the Vce and Ic there. */
  onPickPoint?: (pick: SoaPick) => void;
  /** Names the chart for screen readers. */
  label: string;
  height?: number;
};

const CLIP_ID = 'soa-chart-clip';

const segmentPath = (frame: LogFrame, points: readonly SoaChartPointValue[]) =>
  line<SoaChartPointValue>()
    .x((p) => frame.x(p.vceV))
    .y((p) => frame.y(p.icA))(points.filter((p) => p.vceV > 0 && p.icA > 0)) ?? '';

/**
 * The operating points, each ring sized by the stretches it stands for (larger ones drawn first so
 * smaller ones stay on top), the worst one marked; hundreds of them, so drawn again only when the
 * frame or the points change (not on hover).
 */
const PointMarkers = memo(function PointMarkers({ frame, points, radii }: { frame: LogFrame; points: readonly SoaChartPoint[]; radii: readonly number[] }) {
  const order = useMemo(() => points.map((_, i) => i).sort((a, b) => radii[b] - radii[a] || a - b), [points, radii]);
  const worst = points.findIndex((p) => p.worst);
  const drawn = (i: number) => points[i].vceV > 0 && points[i].icA > 0;
  return (
    <>
      {order.map((i) =>
        drawn(i) && i !== worst ? (
          <Circle key={`p${i}`} cx={frame.x(points[i].vceV)} cy={frame.y(points[i].icA)} r={radii[i]} stroke={markerColours.stroke} fill={markerColours.fill} strokeWidth={1.5} />
        ) : null,
      )}
      {worst >= 0 && drawn(worst) ? (
        <G key="worst">
          <Circle cx={frame.x(points[worst].vceV)} cy={frame.y(points[worst].icA)} r={8} stroke={color.danger} fill="none" strokeWidth={1.5} />
          <Circle cx={frame.x(points[worst].vceV)} cy={frame.y(points[worst].icA)} r={4} fill={color.danger} />
        </G>
      ) : null}
    </>
  );
});

/**
 * Safe operating area on log-log axes: Ic against Vce, each boundary's segments named by the
 * limit that sets them, optional operating points with the worst one marked. Point at the plot
 * to read every boundary's allowed current at that Vce.
 */
export function SoaChart({ boundaries, points = [], onPickPoint, label, height = 300 }: SoaChartProps) {
  const [width, setWidth] = useState(0);
  const [hoverV, setHoverV] = useState<number | null>(null);
  const frame = useMemo(() => {
    const xs: number[] = [];
    const ys: number[] = [];
    const add = (p: SoaChartPointValue) => {
      xs.push(p.vceV);
      ys.push(p.icA);
    };
    for (const b of boundaries) for (const s of b.segments) s.points.forEach(add);
    points.forEach(add);
    return logFrame(width, height, xs, ys);
  }, [boundaries, points, width, height]);

  const radii = useMemo(() => pointRadii(points), [points]);
  const most = useMemo(() => mostOccurrences(points), [points]);
  const markers = useMemo(
    () =>
      frame
        ? points.flatMap((p, i) => {
            if (!(p.vceV > 0 && p.icA > 0)) return [];
            const half = Math.max(6, radii[i] + 1);
            return [{ x: frame.x(p.vceV) - half, y: frame.y(p.icA) - half, width: 2 * half, height: 2 * half }];
          })
        : [],
    [frame, points, radii],
  );
  const labels = useMemo(() => (frame ? segmentLabels(frame, boundaries, markers) : []), [frame, boundaries, markers]);
  const worst = points.find((p) => p.worst);

  const key: ChartKeyItem[] = [
    ...boundaries.map((b, i) => ({ key: `b${i}`, label: b.label, line: boundaryStyle(i) })),
    ...(points.some((p) => !p.worst) ? [{ key: 'points', label: 'Operating points', marker: markerColours }] : []),
    ...(worst ? [{ key: 'worst', label: 'Worst point', marker: { stroke: color.danger, fill: color.danger } }] : []),
  ];

  const plotXY = (event: PointerEvent) => (frame ? { x: event.nativeEvent.offsetX + frame.left, y: event.nativeEvent.offsetY + frame.top } : null);
  const onPointerMove = (event: PointerEvent) => {
    const at = plotXY(event);
    if (frame && at) setHoverV(frame.x.invert(at.x));
  };
  const onPointerUp = (event: PointerEvent) => {
    const at = plotXY(event);
    if (!frame || !at) return;
    // A tap reads the values too: touch screens have no hover.
    setHoverV(frame.x.invert(at.x));
    if (!onPickPoint) return;
    const index = nearestPoint(frame, points, at.x, at.y);
    onPickPoint(index === null ? { vceV: frame.x.invert(at.x), icA: frame.y.invert(at.y) } : { vceV: points[index].vceV, icA: points[index].icA, index });
  };

  if (boundaries.length === 0 && points.length === 0) return <Text tone="muted">No SOA boundary to draw.</Text>;

  const readout =
    hoverV === null
      ? 'Point at or tap the chart to read the allowed current at a Vce.'
      : `At ${formatReading(hoverV)}\u00a0V: ${boundaries
          .map((b) => {
            const at = boundaryCurrentAt(b, hoverV);
            return `${b.label} ${at ? `${formatReading(at.icA)}\u00a0A (${LIMIT_LABEL[at.limit]})` : 'beyond its voltage limit'}`;
          })
          .join(' · ')}`;

  return (
    <View style={styles.chart}>
      {Platform.OS === 'web' ? (
        <Text variant="caption" tone="muted" style={styles.readout} numberOfLines={2}>
          {readout}
        </Text>
      ) : null}
      <View testID="soa-chart-area" style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
        {frame && width > 0 ? (
          <Svg width={width} height={height} role="img" aria-label={label}>
            <Defs>
              <ClipPath id={CLIP_ID}>
                <Rect x={frame.left} y={frame.top - 2} width={frame.right - frame.left} height={frame.bottom - frame.top + 4} />
              </ClipPath>
            </Defs>
            <LogAxes frame={frame} xTitle="Vce (V)" yTitle="Ic (A)" formatX={formatLogValue} formatY={formatLogValue} />
            <G clipPath={`url(#${CLIP_ID})`}>
              {[...boundaries].reverse().map((b, r) => {
                const i = boundaries.length - 1 - r;
                const style = boundaryStyle(i);
                return (
                  <G key={`b${i}`}>
                    {b.segments.map((s, k) => (
                      <Path key={k} d={segmentPath(frame, s.points)} fill="none" stroke={style.stroke} strokeWidth={style.width} strokeDasharray={style.dash} strokeLinejoin="round" />
                    ))}
                    {b.segments.slice(1).map((s, k) =>
                      s.points[0] && s.points[0].icA > 0 ? (
                        <Circle key={`v${k}`} cx={frame.x(s.points[0].vceV)} cy={frame.y(s.points[0].icA)} r={2.5} fill={style.stroke} />
                      ) : null,
                    )}
                  </G>
                );
              })}
            </G>
            {labels.map((l) => (
              <Rect key={`bk${l.key}`} x={l.box.x - 2} y={l.box.y - 1} width={l.box.width + 4} height={l.box.height + 2} rx={2} fill={color.surface} opacity={0.85} />
            ))}
            {labels.map((l) => (
              <SvgText key={`lb${l.key}`} x={l.box.x} y={l.box.y + l.box.height - 3} fontSize={SOA_LABEL_SIZE} fontFamily={fontFamily.medium} fill={l.color}>
                {l.text}
              </SvgText>
            ))}
            <PointMarkers frame={frame} points={points} radii={radii} />
            {hoverV !== null && hoverV >= frame.x.domain()[0] && hoverV <= frame.x.domain()[1] ? (
              <Path d={`M${frame.x(hoverV)},${frame.top}V${frame.bottom}`} stroke={color.ink} strokeWidth={1} strokeDasharray="3 3" />
            ) : null}
          </Svg>
        ) : null}
        {frame && Platform.OS === 'web' ? (
          <View
            testID="soa-chart-plot"
            style={[styles.overlay, overlayWeb, { left: frame.left, top: frame.top, width: frame.right - frame.left, height: frame.bottom - frame.top }]}
            onPointerMove={onPointerMove}
            onPointerLeave={(event: PointerEvent) => {
              // A finger leaves as it lifts: keep its reading until the next tap.
              if (event.nativeEvent.pointerType === 'mouse') setHoverV(null);
            }}
            onPointerUp={onPointerUp}
          />
        ) : null}
      </View>
      <ChartKey items={key} />
      {most > 1 ? (
        <Text variant="caption" tone="muted" testID="soa-point-size-note">
          {`Ring size shows how many stretches of the profile each point stands for: its area grows with the logarithm of the count; the largest ring stands for ${most}.`}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  chart: { gap: spacing.sm },
  readout: { minHeight: 32 },
  overlay: { position: 'absolute' },
});

// Web only: a crosshair pointer; vertical swipes still scroll the page on touch screens.
const overlayWeb = Platform.OS === 'web' ? ({ cursor: 'crosshair', touchAction: 'pan-y' } as unknown as ViewStyle) : null;
