import { line } from 'd3-shape';
import { useMemo, useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';

import { chartColor, color, fontFamily } from '@/constants/theme';

import { finScanDomain, finScanVisible, type FinScanRow } from './fin-scan-model';
import { plotFrame, tickCounts } from './plot-frame';
import { LABEL_SIZE } from './plot-labels';

export type FinScanChartProps = {
  rows: readonly FinScanRow[];
  /** The fin count of the design, and the count with the lowest Rθsa. */
  current: number;
  best: number;
  label: string;
  height?: number;
};

const fmt = (v: number) => String(Number(v.toPrecision(3)));

/** Still-air Rθsa against fin count, the design's count and the best one marked. */
export function FinScanChart({ rows, current, best, label, height = 180 }: FinScanChartProps) {
  const [width, setWidth] = useState(0);
  const domain = useMemo(() => finScanDomain(rows), [rows]);
  const visible = useMemo(() => finScanVisible(rows, domain), [rows, domain]);
  const counts = rows.map((r) => r.finCount);
  const frame = plotFrame(width, height, [Math.min(...counts), Math.max(...counts)], domain);
  const ticks = tickCounts(frame);
  const d = line<FinScanRow>()
    .x((r) => frame.x(r.finCount))
    .y((r) => frame.y(r.rsaKPerW))(visible) ?? '';
  const mark = (n: number) => visible.find((r) => r.finCount === n);
  const cur = mark(current);
  const top = mark(best);
  return (
    <View style={{ height }} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
      {width > 0 && rows.length > 1 ? (
        <Svg width={width} height={height} role="img" aria-label={label}>
          {frame.y.ticks(ticks.y).map((t) => (
            <G key={`y${t}`}>
              <Line x1={frame.left} x2={frame.right} y1={frame.y(t)} y2={frame.y(t)} stroke={chartColor.grid} strokeWidth={1} />
              <SvgText x={frame.left - 6} y={frame.y(t) + 4} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="end">
                {fmt(t)}
              </SvgText>
            </G>
          ))}
          {frame.x.ticks(ticks.x).filter(Number.isInteger).map((t) => (
            <SvgText key={`x${t}`} x={frame.x(t)} y={frame.bottom + 15} fontSize={LABEL_SIZE} fontFamily={fontFamily.regular} fill={color.inkMuted} textAnchor="middle">
              {String(t)}
            </SvgText>
          ))}
          <SvgText x={4} y={frame.top - 9} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted}>
            Rθsa (K/W)
          </SvgText>
          <SvgText x={(frame.left + frame.right) / 2} y={frame.bottom + 32} fontSize={LABEL_SIZE} fontFamily={fontFamily.medium} fill={color.inkMuted} textAnchor="middle">
            Fin count
          </SvgText>
          <Line x1={frame.left} x2={frame.right} y1={frame.bottom} y2={frame.bottom} stroke={chartColor.axis} strokeWidth={1} />
          <Path d={d} stroke={chartColor.devices[0]} strokeWidth={2} fill="none" />
          {top ? <Circle cx={frame.x(top.finCount)} cy={frame.y(top.rsaKPerW)} r={5} fill={color.success} /> : null}
          {cur ? <Circle cx={frame.x(cur.finCount)} cy={frame.y(cur.rsaKPerW)} r={6} fill="none" stroke={color.ink} strokeWidth={2} /> : null}
        </Svg>
      ) : null}
    </View>
  );
}

