import type { ReactNode } from 'react';
import { View, type StyleProp, type ViewStyle } from 'react-native';

import { useTheme, type ColorName } from '@/theme';

/** `tone` tints the card for notices; a plain card sits on the page surface. */
export type CardTone = 'plain' | 'warning' | 'danger' | 'success';

const TONES: Record<CardTone, { background: ColorName; border: ColorName }> = {
  plain: { background: 'surface', border: 'border' },
  warning: { background: 'warningSoft', border: 'warning' },
  danger: { background: 'dangerSoft', border: 'danger' },
  success: { background: 'successSoft', border: 'success' },
};

export type CardProps = {
  children: ReactNode;
  tone?: CardTone;
  style?: StyleProp<ViewStyle>;
  testID?: string;
};

export function Card({ children, tone = 'plain', style, testID }: CardProps) {
  const { colors, radii, spacing } = useTheme();
  const { background, border } = TONES[tone];
  return (
    <View
      testID={testID}
      style={[
        {
          backgroundColor: colors[background],
          borderColor: colors[border],
          borderWidth: 1,
          // A thicker leading edge marks a tinted card without relying on colour alone.
          borderLeftWidth: tone === 'plain' ? 1 : 4,
          borderRadius: radii.md,
          padding: spacing.lg,
          gap: spacing.sm,
        },
        style,
      ]}
    >
      {children}
    </View>
  );
}
