import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteStatus } from '@shared/types/quote';

import { STATUS_LABELS, STATUS_TONES } from './quote-status';

const FILLS = {
  plain: 'border',
  warning: 'warningSoft',
  danger: 'dangerSoft',
  success: 'successSoft',
} as const;

/** The status as a word in a pill; the word carries the meaning, the tint only helps. */
export function StatusBadge({ status }: { status: QuoteStatus }) {
  const { colors, radii, spacing } = useTheme();
  return (
    <View
      testID="quote-status"
      style={{
        alignSelf: 'flex-start',
        backgroundColor: colors[FILLS[STATUS_TONES[status]]],
        borderRadius: radii.pill,
        paddingHorizontal: spacing.md,
        paddingVertical: spacing.xxs,
      }}
    >
      <ThemedText type="label">{STATUS_LABELS[status]}</ThemedText>
    </View>
  );
}
