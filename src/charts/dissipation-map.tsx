import { useId, useMemo, useState } from 'react';
import { Platform, StyleSheet, View, type LayoutChangeEvent, type PointerEvent, type ViewStyle } from 'react-native';
import Svg, { Circle, ClipPath, Defs, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui';
import type { CellStatus } from '@/core/rails';
import { color, fontFamily, spacing } from '@/constants/theme';

import { powerScale } from './dissipation-colour';
import { DissipationLegend } from './dissipation-legend';
import { mapFrame, mapTicks } from './dissipation-map-frame';
import { binPower, cellAt, cellEdges, cellMark, cellRuns, highestPower, statusesPresent, tapBoundaries, tapRegions } from './dissipation-map-model';
import { labelWidth } from './label-layout';
import { BLANK_FILL, MapPatterns, NEUTRAL_FILL, svgId } from './map-patterns';
import { LABEL_SIZE } from './plot-labels';

/** A point to mark on the map, such as a tap's worst case. */
export type MapMarker = { key: string; voutV: number; ioutA: number; label: string; strong?: boolean };

export type DissipationMapProps = {
  voutV: readonly number[];
  ioutA: readonly number[];
  /** W, [vout][iout]; null where no power is dissipated because the load is not served. */
  powerW: readonly (readonly (number | null)[])[];
  status: readonly (readonly CellStatus[])[];
  /** Per cell the tap giving the power (−1: none), to draw the boundaries between taps. */
  tap?: readonly (readonly number[])[];
  tapNames?: readonly string[];
  markers?: readonly MapMarker[];
  /** Names the chart for screen readers. */
  label: string;
  height?: number;
};

/** Colour steps the cells are drawn in (the legend shows the same steps). */
const BINS = 24;

const fmt = (v: number) => String(Number(v.toPrecision(3)));

/**
 * The dissipation of a pass element over output voltage × output current: a heat map in W on a
 * scale that also reads in greyscale, cells in dropout hatched and loads that are not served
 * marked by their reason, the boundaries between taps and the marked worst points.
 */
export function DissipationMap({ voutV, ioutA, powerW, status, tap, tapNames = [], markers = [], label, height = 300 }: DissipationMapProps) {
  const prefix = `map${svgId(useId())}`;
  const [width, setWidth] = useState(0);
  const [hover, setHover] = useState<{ v: number; i: number } | null>(null);
  const top = useMemo(() => highestPower(powerW), [powerW]);
  const scale = useMemo(() => powerScale(top), [top]);
  const runs = useMemo(() => cellRuns(powerW, status, top, BINS), [powerW, status, top]);
  const present = useMemo(() => statusesPresent(status), [status]);
  const frame = useMemo(() => mapFrame(width, height, voutV, ioutA), [width, height, voutV, ioutA]);
  const xe = useMemo(() => cellEdges(voutV), [voutV]);
  const ye = useMemo(() => cellEdges(ioutA), [ioutA]);
  const boundaryPath = useMemo(() => {
    if (!tap) return '';
    return tapBoundaries(tap, voutV, ioutA)
      .map((e) => `M${frame.x(e.x0)},${frame.y(e.y0)}L${frame.x(e.x1)},${frame.y(e.y1)}`)
      .join('');
  }, [tap, voutV, ioutA, frame]);
  const regions = useMemo(() => (tap ? tapRegions(tap, voutV, Math.max(tapNames.length, 1 + Math.max(-1, ...tap.flat()))) : []), [tap, voutV, tapNames.length]);

  if (voutV.length === 0 || ioutA.length === 0) return <Text tone="muted">The map has no cells.</Text>;

  const ticks = mapTicks(frame, voutV, ioutA);
  const ready = width > 0;
  const at = (event: PointerEvent) => cellAt(voutV, ioutA, frame.x.invert(event.nativeEvent.offsetX + frame.left), frame.y.invert(event.nativeEvent.offsetY + frame.top));
  const readout = (() => {
    if (!hover) return 'Point at or tap the map to read the dissipation at an output.';
    const p = powerW[hover.v]?.[hover.i] ?? null;
    const s = status[hover.v]?.[hover.i] ?? 'not-served';
    const k = tap?.[hover.v]?.[hover.i] ?? -1;
    const tapText = k >= 0 ? `, tap ${k + 1}${tapNames[k] ? ` (${tapNames[k]})` : ''}` : '';
    const power = p === null ? 'no power' : `${fmt(p)}\u00a0W`;
    return `${fmt(voutV[hover.v])}\u00a0V, ${fmt(ioutA[hover.i])}\u00a0A: ${power}${tapText}${s === 'ok' ? '' : `; ${cellMark(s, p).label}`}`;
  })();

  return (
    <View style={styles.chart}>
      {Platform.OS === 'web' ? (
        <Text variant="caption" tone="muted" style={styles.readout} numberOfLines={2}>
          {readout}
        </Text>
      ) : null}
      <View style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
        {ready ? (
          <Svg width={width} height={height} role="img" aria-label={label}>
            <Defs>
              <MapPatterns prefix={prefix} />
              <ClipPath id={`${prefix}-clip`}>
                <Rect x={frame.left} y={frame.top} width={frame.right - frame.left} height={frame.bottom - frame.top} />
              </ClipPath>
            </Defs>
            <G clipPath={`url(#${prefix}-clip)`}>
              {runs.map((r) => {
                const mark = cellMark(r.status, r.bin < 0 ? null : 0);
                const x = frame.x(xe[r.v]);
                const y = frame.y(ye[r.iTo + 1]);
                // Half a pixel of overlap hides the seams anti-aliasing leaves between cells.
                const w = frame.x(xe[r.v + 1]) - x + 0.5;
                const h = frame.y(ye[r.iFrom]) - y + 0.5;
                const fill = mark.fill === 'power' ? scale.colour(binPower(r.bin, BINS, top)) : mark.fill === 'neutral' ? NEUTRAL_FILL : BLANK_FILL;
                return (
                  <G key={`${r.v}-${r.iFrom}`}>
                    <Rect x={x} y={y} width={w} height={h} fill={fill} />
                    {mark.pattern === 'none' ? null : <Rect x={x} y={y} width={w} height={h} fill={`url(#${prefix}-${mark.pattern})`} />}
                  </G>
                );
              })}
              {boundaryPath ? (
                <>
                  <Path d={boundaryPath} stroke={color.surface} strokeWidth={4} fill="none" strokeLinecap="square" />
                  <Path d={boundaryPath} stroke={color.ink} strokeWidth={1.75} fill="none" strokeLinecap="square" />
                </>
              ) : null}
            </G>

            {regions.map((r, k) => {
              if (!r) return null;
              const x0 = frame.x(r.fromV);
              const x1 = frame.x(r.toV);
              const long = `Tap ${k + 1}`;
              const text = labelWidth(long, LABEL_SIZE) + 4 < x1 - x0 ? long : String(k + 1);
              return (
                <SvgText key={`tap${k}`} x={(x0 + x1) / 2} y={frame.top - 8} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.ink} textAnchor="middle">
                  {text}
                </SvgText>
              );
            })}

            {ticks.y.map((t) => (
              <SvgText key={`y${t}`} x={frame.left - 6} y={frame.y(t) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {fmt(t)}
              </SvgText>
            ))}
            {ticks.x.map((t) => (
              <G key={`x${t}`}>
                <Line x1={frame.x(t)} x2={frame.x(t)} y1={frame.bottom} y2={frame.bottom + 4} stroke={color.inkMuted} strokeWidth={1} />
                <SvgText x={frame.x(t)} y={frame.bottom + 16} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
                  {fmt(t)}
                </SvgText>
              </G>
            ))}
            <SvgText x={4} y={frame.top - 8} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="start">
              Iout (A)
            </SvgText>
            <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 34} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
              Vout (V)
            </SvgText>
            <Rect x={frame.left} y={frame.top} width={frame.right - frame.left} height={frame.bottom - frame.top} fill="none" stroke={color.borderStrong} strokeWidth={1} />

            {markers.map((m) => {
              const cx = frame.x(m.voutV);
              const cy = frame.y(m.ioutA);
              const w = labelWidth(m.label, LABEL_SIZE);
              const right = cx + 12 + w < frame.right;
              const below = cy - 10 < frame.top;
              return (
                <G key={m.key}>
                  <Circle cx={cx} cy={cy} r={m.strong ? 7 : 5.5} fill="none" stroke={color.surface} strokeWidth={4} />
                  <Circle cx={cx} cy={cy} r={m.strong ? 7 : 5.5} fill="none" stroke={color.ink} strokeWidth={m.strong ? 2.25 : 1.5} />
                  <Circle cx={cx} cy={cy} r={1.75} fill={color.ink} />
                  <Rect x={right ? cx + 10 : cx - 12 - w} y={(below ? cy + 6 : cy - 18) - 1} width={w + 4} height={LABEL_SIZE + 3} rx={2} fill={color.surface} opacity={0.88} />
                  <SvgText x={right ? cx + 12 : cx - 10 - w} y={below ? cy + 16 : cy - 8} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.ink}>
                    {m.label}
                  </SvgText>
                </G>
              );
            })}
          </Svg>
        ) : null}
        {ready && Platform.OS === 'web' ? (
          <View
            testID="dissipation-map-plot"
            style={[styles.overlay, overlayWeb, { left: frame.left, top: frame.top, width: frame.right - frame.left, height: frame.bottom - frame.top }]}
            onPointerDown={(e) => setHover(at(e))}
            onPointerMove={(e) => setHover(at(e))}
            onPointerLeave={() => setHover(null)}
          />
        ) : null}
      </View>
      <DissipationLegend scale={scale} bins={BINS} statuses={present} prefix={`${prefix}-key`} boundaries={Boolean(boundaryPath)} />
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
