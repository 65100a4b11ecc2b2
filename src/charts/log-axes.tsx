import { G, Line, Text as SvgText } from 'react-native-svg';

import { chartColor, color, fontFamily } from '@/constants/theme';

import { logTicks } from './log-axis';
import type { LogFrame } from './log-frame';
import { LABEL_SIZE } from './plot-labels';

export type LogAxesProps = {
  frame: LogFrame;
  xTitle: string;
  yTitle: string;
  formatX: (value: number) => string;
  formatY: (value: number) => string;
};

/** Log-paper grid (decades darker than the 2…9 lines), tick labels and axis titles. */
export function LogAxes({ frame, xTitle, yTitle, formatX, formatY }: LogAxesProps) {
  const { x, y, left, right, top, bottom } = frame;
  const xTicks = logTicks(x.domain() as [number, number], right - left);
  // Labels up the side are one line high, so they need less room than those across.
  const yTicks = logTicks(y.domain() as [number, number], bottom - top, 22, 64);
  return (
    <G>
      {yTicks.map((t) => (
        <G key={`y${t.value}`}>
          <Line x1={left} x2={right} y1={y(t.value)} y2={y(t.value)} stroke={chartColor.grid} strokeWidth={1} opacity={t.decade ? 1 : 0.55} />
          {t.labelled ? (
            <SvgText x={left - 6} y={y(t.value) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
              {formatY(t.value)}
            </SvgText>
          ) : null}
        </G>
      ))}
      {xTicks.map((t) => (
        <G key={`x${t.value}`}>
          <Line x1={x(t.value)} x2={x(t.value)} y1={top} y2={bottom} stroke={chartColor.grid} strokeWidth={1} opacity={t.decade ? 1 : 0.55} />
          {t.labelled ? (
            <SvgText x={x(t.value)} y={bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {formatX(t.value)}
            </SvgText>
          ) : null}
        </G>
      ))}
      <SvgText x={4} y={top - 12} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="start">
        {yTitle}
      </SvgText>
      <SvgText x={(left + right) / 2} y={bottom + 33} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
        {xTitle}
      </SvgText>
      <Line x1={left} x2={right} y1={bottom} y2={bottom} stroke={chartColor.axis} strokeWidth={1} />
      <Line x1={left} x2={left} y1={top} y2={bottom} stroke={chartColor.axis} strokeWidth={1} />
    </G>
  );
}
