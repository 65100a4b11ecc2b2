import { useMemo, useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { chartColor, color, fontFamily } from '@/constants/theme';

import { plotFrame, tickCounts } from './plot-frame';
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

const fmt = (v: number) => String(Number(v.toPrecision(3)));

/** Runs per bin of peak junction temperature, with the target and Tj,max as vertical lines. */
export function ToleranceHistogram({ edgesC, counts, targetC, tjMaxC, label, height = 200 }: ToleranceHistogramProps) {
  const [width, setWidth] = useState(0);
  const model = useMemo(() => histogramModel(edgesC, counts, targetC, tjMaxC), [edgesC, counts, targetC, tjMaxC]);
  const frame = plotFrame(width, height, model.domain, [0, model.maxCount * 1.12]);
  const ticks = tickCounts(frame);
  const limit = (c: number, stroke: string, text: string, dash: string, anchorEnd: boolean, dy = 0) => (
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
    <View testID="tolerance-histogram" style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
      {width > 0 ? (
        <Svg width={width} height={height} role="img" aria-label={label}>
          {frame.y.ticks(ticks.y).filter(Number.isInteger).map((t) => (
            <G key={`y${t}`}>
              <Line x1={frame.left} x2={frame.right} y1={frame.y(t)} y2={frame.y(t)} stroke={chartColor.grid} strokeWidth={1} />
              <SvgText x={frame.left - 6} y={frame.y(t) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {String(t)}
              </SvgText>
            </G>
          ))}
          {frame.x.ticks(ticks.x).map((t) => (
            <SvgText key={`x${t}`} x={frame.x(t)} y={frame.bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {fmt(t)}
            </SvgText>
          ))}
          <SvgText x={4} y={frame.top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted}>
            Runs
          </SvgText>
          <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
            Peak junction temperature (°C)
          </SvgText>
          {model.bars.map((b, i) =>
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
          )}
          <Line x1={frame.left} x2={frame.right} y1={frame.bottom} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
          {/* The target's label sits left of its line, Tj,max's right of it, or a line lower when the edge is near. */}
          {limit(targetC, chartColor.target, 'target', '6 3', frame.x(targetC) - frame.left > 44)}
          {limit(tjMaxC, chartColor.tjMax, 'Tj,max', '2 2', frame.right - frame.x(tjMaxC) < 44, frame.right - frame.x(tjMaxC) < 44 ? 14 : 0)}
        </Svg>
      ) : null}
    </View>
  );
}
