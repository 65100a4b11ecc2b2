import Svg, { Path, Rect } from 'react-native-svg';

import { color } from '@/constants/theme';

export type BrandMarkProps = { size?: number; tone?: 'light' | 'dark' };

/** The product mark: a package seated on a finned sink. */
export function BrandMark({ size = 28, tone = 'dark' }: BrandMarkProps) {
  const ink = tone === 'dark' ? color.ink : color.sidebarText;
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" aria-hidden>
      <Rect x={10} y={4} width={12} height={9} rx={1.5} fill={color.accent} />
      <Path d="M4 16h24 M7 16v12 M12.5 16v12 M19.5 16v12 M25 16v12" stroke={ink} strokeWidth={2.2} strokeLinecap="round" />
    </Svg>
  );
}
