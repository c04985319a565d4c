import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { nameSpring } from '@shared/sizing/decision-text';
import type { SpringOffer } from '@shared/types/sizing';
import { useTheme } from '@/theme';

/** A catalogue spring: its rate as labelled, its part number and how many are on the shelf. */
export function SpringLine({ title, spring, testID }: { title: string; spring: SpringOffer; testID: string }) {
  const { spacing } = useTheme();
  const format = useQuantityFormat();
  return (
    <View style={{ gap: spacing.xxs }}>
      <ThemedText type="label">{title}</ThemedText>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.xs }}>
        <ThemedText type="figure" testID={testID}>
          {nameSpring(spring, format)}
        </ThemedText>
        <ThemedText color="textMuted">
          {spring.family} · {spring.sku} · {spring.inStock ? `${spring.available} in stock` : 'to order'}
        </ThemedText>
      </View>
    </View>
  );
}
