import { useWindowDimensions } from 'react-native';

import { breakpoints } from './theme';

export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return { width, isTablet: width >= breakpoints.tablet, isWide: width >= breakpoints.wide };
}
