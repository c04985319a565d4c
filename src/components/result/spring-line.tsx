import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import type { CandidateResult } from '@shared/types/sizing';
import { useTheme } from '@/theme';

/** A catalogue spring: its rate, its part number and how many are on the shelf. */
export function SpringLine({ title, spring, testID }: { title: string; spring: CandidateResult; testID: string }) {
  const { spacing } = useTheme();
  return (
    <View style={{ gap: spacing.xxs }}>
      <ThemedText type="label">{title}</ThemedText>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.xs }}>
        <Quantity value={spring.rateNmm} kind="rate" testID={testID} />
        <ThemedText color="textMuted">
          {spring.family} · {spring.sku} · {spring.inStock ? `${spring.available} in stock` : 'to order'}
        </ThemedText>
      </View>
    </View>
  );
}
