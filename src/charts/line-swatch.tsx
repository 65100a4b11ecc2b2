import Svg, { Line } from 'react-native-svg';

import type { LineStyle } from './heat-curves-model';

export type LineSwatchProps = { style: LineStyle; width?: number };

/** A short sample of a series' line (colour and dash), for legends and read-outs. */
export function LineSwatch({ style, width = 24 }: LineSwatchProps) {
  return (
    <Svg width={width} height={10} aria-hidden>
      <Line
        x1={1}
        x2={width - 1}
        y1={5}
        y2={5}
        stroke={style.stroke}
        strokeWidth={Math.max(2, style.width)}
        strokeDasharray={style.dash}
        strokeLinecap={style.dash?.startsWith('1.5') ? 'round' : 'butt'}
      />
    </Svg>
  );
}
