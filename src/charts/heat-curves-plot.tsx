import { line } from 'd3-shape';
import { memo, useMemo } from 'react';
import Svg, { Circle, ClipPath, Defs, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { chartColor, color, fontFamily } from '@/constants/theme';

import type { CurveSeries, LimitLine } from './heat-curves-model';
import type { PlotFrame } from './plot-frame';
import { LABEL_SIZE, plotLabels } from './plot-labels';
import { valueAt, visibleRange } from './series-sample';
import { temperatureTicks } from './temperature-axis';
import { timeTicks } from './time-axis';

export type HeatCurvesPlotProps = {
  frame: PlotFrame;
  curves: readonly CurveSeries[];
  limits: readonly LimitLine[];
  tickCount: { x: number; y: number };
  cursorS: number | null;
  /** A range being dragged out, px. */
  selection: [number, number] | null;
  label: string;
};

const CLIP_ID = 'heat-curves-clip';

const Curves = memo(function Curves({ frame, curves }: { frame: PlotFrame; curves: readonly CurveSeries[] }) {
  const paths = useMemo(() => {
    const [t0, t1] = frame.x.domain();
    return curves.map((curve) => {
      const { timeS, valueC } = curve.series;
      const { start, end } = visibleRange(curve.series, t0, t1);
      const indices = Array.from({ length: end - start + 1 }, (_, k) => start + k);
      const d = line<number>()
        .x((i) => frame.x(timeS[i]))
        .y((i) => frame.y(valueC[i]))(indices);
      return { curve, d: d ?? '' };
    });
  }, [frame, curves]);
  return (
    <G clipPath={`url(#${CLIP_ID})`}>
      {paths.map(({ curve, d }) => (
        <Path
          key={curve.key}
          d={d}
          fill="none"
          stroke={curve.style.stroke}
          strokeWidth={curve.style.width}
          strokeDasharray={curve.style.dash}
          strokeLinejoin="round"
          strokeLinecap={curve.kind === 'sink' ? 'round' : 'butt'}
        />
      ))}
    </G>
  );
});

/** The drawing itself: grid, axes with units, limit lines, curves, peaks, crosshair and selection. */
export function HeatCurvesPlot({ frame, curves, limits, tickCount, cursorS, selection, label }: HeatCurvesPlotProps) {
  const { x, y, left, right, top, bottom } = frame;
  const [t0, t1] = x.domain();
  const time = timeTicks(t0, t1, tickCount.x);
  const temps = temperatureTicks(y.domain() as [number, number], tickCount.y);
  const inView = (t: number) => t >= t0 && t <= t1;
  const cursorX = cursorS !== null && inView(cursorS) ? x(cursorS) : null;
  const labels = useMemo(() => plotLabels(frame, limits, curves), [frame, limits, curves]);

  return (
    <Svg width={frame.width} height={frame.height} role="img" aria-label={label}>
      <Defs>
        <ClipPath id={CLIP_ID}>
          <Rect x={left} y={top - 2} width={right - left} height={bottom - top + 4} />
        </ClipPath>
      </Defs>

      {temps.map((tick) => (
        <G key={`y${tick.value}`}>
          <Line x1={left} x2={right} y1={y(tick.value)} y2={y(tick.value)} stroke={chartColor.grid} strokeWidth={1} />
          <SvgText x={left - 6} y={y(tick.value) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
            {tick.label}
          </SvgText>
        </G>
      ))}
      <SvgText x={left - 6} y={top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="end">
        °C
      </SvgText>

      {time.ticks.map((tick) => (
        <G key={`x${tick.value}`}>
          <Line x1={x(tick.value)} x2={x(tick.value)} y1={top} y2={bottom} stroke={chartColor.grid} strokeWidth={1} />
          <SvgText x={x(tick.value)} y={bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
            {tick.label}
          </SvgText>
        </G>
      ))}
      <SvgText x={(left + right) / 2} y={bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
        {`Time (${time.unit.symbol})`}
      </SvgText>
      <Line x1={left} x2={right} y1={bottom} y2={bottom} stroke={chartColor.axis} strokeWidth={1} />
      <Line x1={left} x2={left} y1={top} y2={bottom} stroke={chartColor.axis} strokeWidth={1} />

      {limits.map((limit) => {
        const ly = y(limit.valueC);
        if (ly < top - 1 || ly > bottom + 1) return null;
        return (
          <G key={limit.key}>
            <Line x1={left} x2={right} y1={ly} y2={ly} stroke={limit.style.stroke} strokeWidth={limit.style.width} strokeDasharray={limit.style.dash} />
          </G>
        );
      })}

      <Curves frame={frame} curves={curves} />

      {curves.map((curve) =>
        curve.peak && inView(curve.peak.timeS) ? (
          <G key={`peak-${curve.key}`}>
            <Circle
              cx={x(curve.peak.timeS)}
              cy={y(curve.peak.valueC)}
              r={curve.kind === 'junction' ? 4 : 3.5}
              fill={curve.kind === 'junction' ? curve.style.stroke : color.surface}
              stroke={curve.style.stroke}
              strokeWidth={1.5}
            />
          </G>
        ) : null,
      )}

      {labels.map((label) => (
        // A pale backing keeps a label readable over dense curves.
        <Rect
          key={`backing-${label.key}`}
          x={label.box.x - 2}
          y={label.box.y - 1}
          width={label.box.width + 4}
          height={label.box.height + 2}
          rx={2}
          fill={color.surface}
          opacity={0.85}
        />
      ))}
      {labels.map((label) => (
        <SvgText
          key={`label-${label.key}`}
          x={label.box.x}
          y={label.box.y + label.box.height - 3}
          fontSize={LABEL_SIZE}
          fontFamily={fontFamily.medium}
          fill={label.color}
        >
          {label.text}
        </SvgText>
      ))}

      {cursorX !== null && cursorS !== null ? (
        <G>
          <Line x1={cursorX} x2={cursorX} y1={top} y2={bottom} stroke={chartColor.cursor} strokeWidth={1} strokeDasharray="3 3" />
          {curves.map((curve) => {
            const v = valueAt(curve.series, cursorS);
            return Number.isNaN(v) ? null : (
              <Circle key={`cursor-${curve.key}`} cx={cursorX} cy={y(v)} r={3} fill={color.surface} stroke={curve.style.stroke} strokeWidth={1.5} />
            );
          })}
        </G>
      ) : null}

      {selection ? (
        <Rect
          x={Math.min(...selection)}
          y={top}
          width={Math.abs(selection[1] - selection[0])}
          height={bottom - top}
          fill={chartColor.selection}
          stroke={color.accent}
          strokeWidth={1}
        />
      ) : null}
    </Svg>
  );
}
