import { useWindowDimensions } from 'react-native';
import { breakpoints } from '@/src/theme';

/** Phone first; from `breakpoints.wide` up the shell shows side navigation and split panes. */
export function useBreakpoint(): { wide: boolean; width: number } {
  const { width } = useWindowDimensions();
  return { wide: width >= breakpoints.wide, width };
}
