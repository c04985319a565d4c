import { useWindowDimensions } from 'react-native';

import { breakpoints } from './tokens';

export type Layout = {
  width: number;
  /** At least `breakpoints.wide`: room for side navigation beside the content. */
  isWide: boolean;
};

export function useLayout(): Layout {
  const { width } = useWindowDimensions();
  return { width, isWide: width >= breakpoints.wide };
}
