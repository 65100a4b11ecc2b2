import { useMemo, useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';

import type { CycleHistogram } from '@/core/study';
import { chartColor, color, fontFamily } from '@/constants/theme';

import { HEAVY_DAMAGE_SHARE, countDomain, cycleBars, shareText } from './cycle-histogram-model';
import { plotFrame, tickCounts } from './plot-frame';
import { LABEL_SIZE } from './plot-labels';

export type CycleHistogramChartProps = {
  histogram: CycleHistogram;
  label: string;
  height?: number;
  testID?: string;
};

const fmt = (v: number) => String(Number(v.toPrecision(3)));
/** A bar of a fraction of a cycle still shows. */
const MIN_BAR_PX = 2;

/**
 * Rainflow cycles per repeat against their junction temperature range ΔTj; bars holding a
 * large share of the damage are dark and carry that share, so the chart reads without colour.
 */
export function CycleHistogramChart({ histogram, label, height = 200, testID }: CycleHistogramChartProps) {
  const [width, setWidth] = useState(0);
  const bars = useMemo(() => cycleBars(histogram), [histogram]);
  const edges = histogram.edgesK;
  const frame = plotFrame(width, height, [0, edges.length > 0 ? edges[edges.length - 1] : 1], countDomain(bars));
  const ticks = tickCounts(frame);
  return (
    <View testID={testID} style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
      {width > 0 && bars.length > 0 ? (
        <Svg width={width} height={height} role="img" aria-label={label}>
          {frame.y.ticks(ticks.y).map((t) => (
            <G key={`y${t}`}>
              <Line x1={frame.left} x2={frame.right} y1={frame.y(t)} y2={frame.y(t)} stroke={chartColor.grid} strokeWidth={1} />
              <SvgText x={frame.left - 6} y={frame.y(t) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {fmt(t)}
              </SvgText>
            </G>
          ))}
          {frame.x.ticks(ticks.x).map((t) => (
            <SvgText key={`x${t}`} x={frame.x(t)} y={frame.bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {fmt(t)}
            </SvgText>
          ))}
          <SvgText x={4} y={frame.top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted}>
            Cycles per repeat
          </SvgText>
          <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
            Junction swing ΔTj (K)
          </SvgText>
          {bars.map((b) => {
            const x0 = frame.x(b.fromK) + 1;
            const x1 = frame.x(b.toK) - 1;
            const y = Math.min(frame.y(b.count), frame.bottom - MIN_BAR_PX);
            const heavy = b.damageShare >= HEAVY_DAMAGE_SHARE;
            return (
              <G key={b.fromK}>
                <Rect
                  x={x0}
                  y={y}
                  width={Math.max(1, x1 - x0)}
                  height={frame.bottom - y}
                  fill={heavy ? chartColor.devices[0] : color.accentSoft}
                  stroke={chartColor.devices[0]}
                  strokeWidth={1}
                />
                {heavy ? (
                  <SvgText x={(x0 + x1) / 2} y={Math.max(frame.top + 2, y - 4)} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.ink} textAnchor="middle">
                    {shareText(b.damageShare)}
                  </SvgText>
                ) : null}
              </G>
            );
          })}
          <Line x1={frame.left} x2={frame.right} y1={frame.bottom} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
        </Svg>
      ) : null}
    </View>
  );
}
