import { useWindowDimensions } from 'react-native';

import { breakpoint } from '@/constants/theme';

/** True from the wide breakpoint up: sidebar shell and table views. */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  return width >= breakpoint.wide;
}
