import { useMemo, useRef, useState } from 'react';
import { Platform, StyleSheet, View, type LayoutChangeEvent, type PointerEvent, type ViewStyle } from 'react-native';

import { Button, Text } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';

import { clampDomain, isFullView, panToInclude, zoomAround, type TimeDomain } from './chart-zoom';
import { HeatCurvesLegend } from './heat-curves-legend';
import { heatCurvesModel } from './heat-curves-model';
import { HeatCurvesPlot } from './heat-curves-plot';
import { HeatCurvesReadout } from './heat-curves-readout';
import { plotFrame, PLOT_MARGIN, tickCounts } from './plot-frame';
import { extentIn } from './series-sample';
import { temperatureDomain } from './temperature-axis';
import { formatSpan, formatTimeAt } from './time-axis';

export type HeatCurvesChartProps = {
  result: StudyResult;
  /** The pinned crosshair time (s), owned by the parent so other views (events) can move it. */
  cursorS: number | null;
  onCursorChange: (timeS: number | null) => void;
  /** Called with the time of a tap or click on the plot (for pinning a comment to a time). */
  onPickTime?: (timeS: number) => void;
  /** Total height, px. */
  height?: number;
};

/** Drags shorter than this are taps, px. */
const DRAG_THRESHOLD_PX = 6;
const ZOOM_STEP = 0.5;

type Drag = { x0: number; pointer: string; selecting: boolean };

/**
 * Junction, case and sink temperatures against time with their limits and peaks. Point at
 * the plot to read values; tap or click to pin the crosshair; drag across it with a mouse
 * (or use the buttons) to zoom the time axis.
 */
export function HeatCurvesChart({ result, cursorS, onCursorChange, onPickTime, height = 300 }: HeatCurvesChartProps) {
  const model = useMemo(() => heatCurvesModel(result), [result]);
  const full: TimeDomain = useMemo(() => [0, Math.max(result.durationS, Number.MIN_VALUE)], [result.durationS]);
  const [width, setWidth] = useState(0);
  // The zoom belongs to one result; a new result starts on the whole run.
  const [zoom, setZoom] = useState<{ full: TimeDomain; domain: TimeDomain } | null>(null);
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());
  const [showLimits, setShowLimits] = useState(true);
  const [hoverS, setHoverS] = useState<number | null>(null);
  const [selection, setSelection] = useState<[number, number] | null>(null);
  const drag = useRef<Drag | null>(null);

  const zoomed = zoom?.full === full ? zoom.domain : full;
  // A time picked elsewhere (an event) may lie outside the zoomed view: the view slides to it.
  const view = useMemo(() => (cursorS === null ? zoomed : panToInclude(zoomed, full, cursorS)), [zoomed, full, cursorS]);
  const setView = (domain: TimeDomain) => setZoom({ full, domain });

  const shown = useMemo(() => model.curves.filter((c) => !hidden.has(c.key)), [model, hidden]);
  const limits = useMemo(() => (showLimits ? model.limits : []), [showLimits, model]);

  const frame = useMemo(() => {
    let low = Infinity;
    let high = -Infinity;
    for (const curve of shown) {
      const [a, b] = extentIn(curve.series, view[0], view[1]);
      low = Math.min(low, a);
      high = Math.max(high, b);
      if (curve.peak && curve.peak.timeS >= view[0] && curve.peak.timeS <= view[1]) high = Math.max(high, curve.peak.valueC);
    }
    for (const limit of limits) {
      low = Math.min(low, limit.valueC);
      high = Math.max(high, limit.valueC);
    }
    const provisional = plotFrame(width, height, view, [0, 1]);
    return plotFrame(width, height, view, temperatureDomain(low, high, tickCounts(provisional).y));
  }, [shown, limits, view, width, height]);

  const timeOf = (px: number) => frame.x.invert(Math.min(frame.right, Math.max(frame.left, px)));
  const xOf = (event: PointerEvent) => event.nativeEvent.offsetX + PLOT_MARGIN.left;

  const onPointerDown = (event: PointerEvent) => {
    drag.current = { x0: xOf(event), pointer: event.nativeEvent.pointerType, selecting: false };
    const target = event.currentTarget as unknown as { setPointerCapture?: (id: number) => void };
    target.setPointerCapture?.(event.nativeEvent.pointerId);
  };
  const onPointerMove = (event: PointerEvent) => {
    const x = xOf(event);
    const d = drag.current;
    // With a mouse a drag selects a range; a finger scrubs the crosshair instead.
    if (d && d.pointer === 'mouse' && (d.selecting || Math.abs(x - d.x0) > DRAG_THRESHOLD_PX)) {
      d.selecting = true;
      setSelection([d.x0, Math.min(frame.right, Math.max(frame.left, x))]);
      return;
    }
    setHoverS(timeOf(x));
  };
  const onPointerUp = (event: PointerEvent) => {
    const d = drag.current;
    drag.current = null;
    setSelection(null);
    const x = xOf(event);
    if (d?.selecting) {
      if (Math.abs(x - d.x0) > DRAG_THRESHOLD_PX) setView(clampDomain([timeOf(d.x0), timeOf(x)], full));
      return;
    }
    const t = timeOf(x);
    onCursorChange(t);
    onPickTime?.(t);
    if (d?.pointer !== 'mouse') setHoverS(null);
  };
  const onPointerLeave = () => {
    if (!drag.current) setHoverS(null);
  };
  const onPointerCancel = () => {
    drag.current = null;
    setSelection(null);
    setHoverS(null);
  };

  const zoomCentre = cursorS !== null && cursorS >= view[0] && cursorS <= view[1] ? cursorS : (view[0] + view[1]) / 2;
  const span = view[1] - view[0];
  const whole = isFullView(view, full);

  if (model.curves.length === 0) {
    return <Text tone="muted">This result holds no chart series.</Text>;
  }

  return (
    <View style={styles.chart}>
      <View style={styles.toolbar}>
        <Text variant="caption" tone="muted" style={styles.range}>
          {whole
            ? `Whole run, ${formatSpan(full[1])}`
            : `${formatTimeAt(view[0], span)} to ${formatTimeAt(view[1], span)} of ${formatSpan(full[1])}`}
        </Text>
        <View style={styles.buttons}>
          <Button label="Zoom in" variant="secondary" style={styles.button} onPress={() => setView(zoomAround(view, full, zoomCentre, ZOOM_STEP))} />
          <Button label="Zoom out" variant="secondary" style={styles.button} disabled={whole} onPress={() => setView(zoomAround(view, full, zoomCentre, 1 / ZOOM_STEP))} />
          <Button label="Whole run" variant="ghost" style={styles.button} disabled={whole} onPress={() => setView(full)} />
        </View>
      </View>
      <HeatCurvesReadout
        curves={shown}
        timeS={hoverS ?? cursorS}
        spanS={span}
        hint="Point at the curves or tap them to read the values. Drag across the plot with a mouse to zoom."
      />
      <View style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
        {width > 0 ? (
          <HeatCurvesPlot
            frame={frame}
            curves={shown}
            limits={limits}
            tickCount={tickCounts(frame)}
            cursorS={hoverS ?? cursorS}
            selection={selection}
            label={`Heat curves: ${shown.map((c) => c.label).join(', ')} against time`}
          />
        ) : null}
        <View
          testID="heat-curves-plot"
          style={[styles.overlay, overlayWeb, { left: frame.left, top: frame.top, width: Math.max(0, frame.right - frame.left), height: Math.max(0, frame.bottom - frame.top) }]}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerLeave={onPointerLeave}
          onPointerCancel={onPointerCancel}
        />
      </View>
      <HeatCurvesLegend
        curves={model.curves}
        limits={model.limits}
        hidden={hidden}
        showLimits={showLimits}
        onToggle={(key) =>
          setHidden((h) => {
            const next = new Set(h);
            if (!next.delete(key)) next.add(key);
            return next;
          })
        }
        onToggleLimits={() => setShowLimits((s) => !s)}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  chart: { gap: spacing.sm },
  toolbar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  range: { flexShrink: 1 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  button: { minHeight: 36, paddingHorizontal: spacing.md },
  overlay: { position: 'absolute' },
});

// Web only: a crosshair pointer, and vertical swipes still scroll the page on touch screens
// while horizontal ones scrub the plot (CSS touch-action, which React Native has no style for).
const overlayWeb = Platform.OS === 'web' ? ({ cursor: 'crosshair', touchAction: 'pan-y' } as unknown as ViewStyle) : null;
