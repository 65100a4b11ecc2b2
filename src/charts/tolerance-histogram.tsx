import { useMemo } from 'react';
import { G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { chartColor, fontFamily } from '@/constants/theme';

import { HistogramFrame } from './histogram-frame';
import type { PlotFrame } from './plot-frame';
import { LABEL_SIZE } from './plot-labels';
import { histogramModel } from './tolerance-histogram-model';

export type ToleranceHistogramProps = {
  edgesC: readonly number[];
  counts: readonly number[];
  targetC: number;
  tjMaxC: number;
  label: string;
  height?: number;
};

/** Runs per bin of peak junction temperature, with the target and Tj,max as vertical lines. */
export function ToleranceHistogram({ edgesC, counts, targetC, tjMaxC, label, height = 200 }: ToleranceHistogramProps) {
  const model = useMemo(() => histogramModel(edgesC, counts, targetC, tjMaxC), [edgesC, counts, targetC, tjMaxC]);
  const limit = (frame: PlotFrame, c: number, stroke: string, text: string, dash: string, anchorEnd: boolean, dy = 0) => (
    <G>
      <Line x1={frame.x(c)} x2={frame.x(c)} y1={frame.top} y2={frame.bottom} stroke={stroke} strokeWidth={2} strokeDasharray={dash} />
      <SvgText
        x={frame.x(c) + (anchorEnd ? -4 : 4)}
        y={frame.top + 10 + dy}
        fontSize={LABEL_SIZE}
        fontFamily={fontFamily.medium}
        fill={stroke}
        textAnchor={anchorEnd ? 'end' : 'start'}
      >
        {text}
      </SvgText>
    </G>
  );
  return (
    <HistogramFrame
      xDomain={model.domain}
      yDomain={[0, model.maxCount * 1.12]}
      xTitle="Peak junction temperature (°C)"
      yTitle="Runs"
      label={label}
      height={height}
      testID="tolerance-histogram"
      wholeTicks
      formatY={String}
      bars={(frame) =>
        model.bars.map((b, i) =>
          b.count > 0 ? (
            <Rect
              key={i}
              x={frame.x(b.x0) + 0.5}
              width={Math.max(1, frame.x(b.x1) - frame.x(b.x0) - 1)}
              y={frame.y(b.count)}
              height={frame.bottom - frame.y(b.count)}
              fill={b.x0 >= tjMaxC ? chartColor.tjMax : b.x0 >= targetC ? chartColor.target : chartColor.devices[0]}
            />
          ) : null,
        )
      }
      // The target's label sits left of its line, Tj,max's right of it, or a line lower when the edge is near.
      over={(frame) => (
        <>
          {limit(frame, targetC, chartColor.target, 'target', '6 3', frame.x(targetC) - frame.left > 44)}
          {limit(frame, tjMaxC, chartColor.tjMax, 'Tj,max', '2 2', frame.right - frame.x(tjMaxC) < 44, frame.right - frame.x(tjMaxC) < 44 ? 14 : 0)}
        </>
      )}
    />
  );
}
