import { useWindowDimensions } from 'react-native';
import { breakpoints } from './tokens';

/** Phone under 900 px (bottom bar, stacked), desktop from 900 px (side rail, columns). */
export function useLayout() {
  const { width, height } = useWindowDimensions();
  return {
    width,
    height,
    isWide: width >= breakpoints.desktop,
    isTablet: width >= breakpoints.tablet,
  };
}
