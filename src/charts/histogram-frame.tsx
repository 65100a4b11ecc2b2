import { useState, type ReactNode } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Text as SvgText } from 'react-native-svg';

import { chartColor, color, fontFamily } from '@/constants/theme';

import { plotFrame, tickCounts, type PlotFrame } from './plot-frame';
import { LABEL_SIZE } from './plot-labels';

export type HistogramFrameProps = {
  xDomain: [number, number];
  yDomain: [number, number];
  xTitle: string;
  yTitle: string;
  /** Names the chart for screen readers. */
  label: string;
  height: number;
  testID?: string;
  /** False draws nothing inside the box (e.g. no bars yet); the box keeps its height. */
  show?: boolean;
  /** Only whole-number count ticks (a count of runs has no fractions). */
  wholeTicks?: boolean;
  formatY?: (value: number) => string;
  /** The bars, drawn over the grid and under the baseline. */
  bars: (frame: PlotFrame) => ReactNode;
  /** Drawn over the baseline (limit lines). */
  over?: (frame: PlotFrame) => ReactNode;
};

const fmt = (v: number) => String(Number(v.toPrecision(3)));

/**
 * The box, grid, tick labels, axis titles and baseline a histogram's bars stand in; it takes the
 * width it is laid out at. The bars and anything above them come from the chart.
 */
export function HistogramFrame({ xDomain, yDomain, xTitle, yTitle, label, height, testID, show = true, wholeTicks = false, formatY = fmt, bars, over }: HistogramFrameProps) {
  const [width, setWidth] = useState(0);
  const frame = plotFrame(width, height, xDomain, yDomain);
  const ticks = tickCounts(frame);
  const yTicks = frame.y.ticks(ticks.y);
  return (
    <View testID={testID} style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
      {width > 0 && show ? (
        <Svg width={width} height={height} role="img" aria-label={label}>
          {(wholeTicks ? yTicks.filter(Number.isInteger) : yTicks).map((t) => (
            <G key={`y${t}`}>
              <Line x1={frame.left} x2={frame.right} y1={frame.y(t)} y2={frame.y(t)} stroke={chartColor.grid} strokeWidth={1} />
              <SvgText x={frame.left - 6} y={frame.y(t) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {formatY(t)}
              </SvgText>
            </G>
          ))}
          {frame.x.ticks(ticks.x).map((t) => (
            <SvgText key={`x${t}`} x={frame.x(t)} y={frame.bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {fmt(t)}
            </SvgText>
          ))}
          <SvgText x={4} y={frame.top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted}>
            {yTitle}
          </SvgText>
          <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
            {xTitle}
          </SvgText>
          {bars(frame)}
          <Line x1={frame.left} x2={frame.right} y1={frame.bottom} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
          {over ? over(frame) : null}
        </Svg>
      ) : null}
    </View>
  );
}
