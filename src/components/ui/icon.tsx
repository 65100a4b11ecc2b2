import Svg, { Path } from 'react-native-svg';

import { color as palette } from '@/constants/theme';

/** Line icons drawn for this app on a 24-unit grid. */
const paths = {
  studies: 'M6 3h9l4 4v14H6z M15 3v4h4 M9 12h7 M9 16h7',
  account: 'M12 12a4 4 0 1 0 0-8 4 4 0 0 0 0 8z M4 21c1.2-4 4.3-6 8-6s6.8 2 8 6',
  signOut: 'M14 4H5v16h9 M10 12h10 M16 8l4 4-4 4',
  back: 'M15 5l-7 7 7 7',
  plus: 'M12 5v14 M5 12h14',
  sortUp: 'M8 14l4-5 4 5z',
  sortDown: 'M8 10l4 5 4-5z',
  sortNone: 'M8 10l4-4 4 4z M8 14l4 4 4-4z',
  team: 'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7z M2.5 20c.9-3.4 3.4-5.2 6.5-5.2s5.6 1.8 6.5 5.2 M16 4.3a3.5 3.5 0 0 1 0 6.4 M18 14.9c1.8.7 3 2.4 3.5 5.1',
  outbox: 'M3 6h18v12H3z M3 7l9 6 9-6',
  activity: 'M9 6h11 M9 12h11 M9 18h11 M4.5 6h.01 M4.5 12h.01 M4.5 18h.01',
  chevronDown: 'M6 9l6 6 6-6',
  pin: 'M12 21s-6-5.6-6-11a6 6 0 1 1 12 0c0 5.4-6 11-6 11z M12 12.5a2.5 2.5 0 1 0 0-5 2.5 2.5 0 0 0 0 5z',
  heatsink: 'M3 17h18v3H3z M5.5 17V7 M10 17V4 M14 17V4 M18.5 17V7',
  interface: 'M4 4h16v5H4z M4 15h16v5H4z M6 12h12',
  part: 'M6 3h12v5H6z M12 5.5h.01 M7 8h10v7H7z M9 15v6 M12 15v6 M15 15v6',
} as const;

export type IconName = keyof typeof paths;

export type IconProps = { name: IconName; size?: number; color?: string };

export function Icon({ name, size = 22, color = palette.ink }: IconProps) {
  const filled = name.startsWith('sort');
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      <Path
        d={paths[name]}
        stroke={filled ? 'none' : color}
        fill={filled ? color : 'none'}
        strokeWidth={1.8}
        strokeLinecap="round"
        strokeLinejoin="round"
      />
    </Svg>
  );
}
