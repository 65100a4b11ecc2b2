import { useMemo } from 'react';
import { G, Rect, Text as SvgText } from 'react-native-svg';

import type { CycleHistogram } from '@/core/study';
import { chartColor, color, fontFamily } from '@/constants/theme';

import { HEAVY_DAMAGE_SHARE, countDomain, cycleBars, shareText } from './cycle-histogram-model';
import { HistogramFrame } from './histogram-frame';
import { LABEL_SIZE } from './plot-labels';

export type CycleHistogramChartProps = {
  histogram: CycleHistogram;
  label: string;
  height?: number;
  testID?: string;
};

/** A bar of a fraction of a cycle still shows. */
const MIN_BAR_PX = 2;

/**
 * Rainflow cycles per repeat against their junction temperature range ΔTj; bars holding a
 * large share of the damage are dark and carry that share, so the chart reads without colour.
 */
export function CycleHistogramChart({ histogram, label, height = 200, testID }: CycleHistogramChartProps) {
  const bars = useMemo(() => cycleBars(histogram), [histogram]);
  const edges = histogram.edgesK;
  return (
    <HistogramFrame
      xDomain={[0, edges.length > 0 ? edges[edges.length - 1] : 1]}
      yDomain={countDomain(bars)}
      xTitle="Junction swing ΔTj (K)"
      yTitle="Cycles per repeat"
      label={label}
      height={height}
      testID={testID}
      show={bars.length > 0}
      bars={(frame) =>
        bars.map((b) => {
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
        })
      }
    />
  );
}
