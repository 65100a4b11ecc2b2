import { Circle, Line, Pattern } from 'react-native-svg';

import { color } from '@/constants/theme';

import type { CellMark } from './dissipation-map-model';

/** Fill of cells without a power of their own (not served for a reason) and of cells no tap serves. */
export const NEUTRAL_FILL = '#CDD0C8';
export const BLANK_FILL = color.surface;

const INK = color.ink;

export type PatternName = Exclude<CellMark['pattern'], 'none'>;
export const PATTERN_NAMES: readonly PatternName[] = ['hatch', 'lines', 'dots', 'cross'];

/** The overlay patterns of the map, ids prefixed so several charts on one page stay apart. */
export function MapPatterns({ prefix }: { prefix: string }) {
  return (
    <>
      <Pattern id={`${prefix}-hatch`} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <Line x1={0} y1={0} x2={0} y2={6} stroke={INK} strokeWidth={1.4} opacity={0.55} />
      </Pattern>
      <Pattern id={`${prefix}-lines`} width={5} height={5} patternUnits="userSpaceOnUse">
        <Line x1={0} y1={2.5} x2={5} y2={2.5} stroke={INK} strokeWidth={1} opacity={0.6} />
      </Pattern>
      <Pattern id={`${prefix}-dots`} width={5} height={5} patternUnits="userSpaceOnUse">
        <Circle cx={2.5} cy={2.5} r={1.1} fill={INK} opacity={0.7} />
      </Pattern>
      <Pattern id={`${prefix}-cross`} width={7} height={7} patternUnits="userSpaceOnUse">
        <Line x1={0} y1={0} x2={7} y2={7} stroke={INK} strokeWidth={0.8} opacity={0.35} />
        <Line x1={7} y1={0} x2={0} y2={7} stroke={INK} strokeWidth={0.8} opacity={0.35} />
      </Pattern>
    </>
  );
}

/** An id usable inside url(#…) on the web (React's ids hold colons). */
export const svgId = (raw: string) => raw.replace(/[^A-Za-z0-9_-]/g, '');
