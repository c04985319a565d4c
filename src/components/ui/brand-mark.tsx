import Svg, { Path, Rect } from 'react-native-svg';

import { useTheme } from '@/theme';

/** The product's mark: a coil spring between two seats, drawn on an accent tile. */
export function BrandMark({ size = 32 }: { size?: number }) {
  const { colors } = useTheme();
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" accessibilityElementsHidden>
      <Rect width={32} height={32} rx={8} fill={colors.accent} />
      <Path d="M9 7h14M9 25h14" stroke={colors.onAccent} strokeWidth={2.4} strokeLinecap="round" />
      <Path
        d="M16 7 21 10 11 13 21 16 11 19 21 22 16 25"
        stroke={colors.onAccent}
        strokeWidth={2}
        strokeLinejoin="round"
        strokeLinecap="round"
        fill="none"
      />
    </Svg>
  );
}
