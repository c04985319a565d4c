import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteStatusEventView } from '@shared/types/quote';

import { STATUS_LABELS, formatDateTime } from './quote-status';

/** Every change of status: to what, who made it and when. */
export function QuoteHistory({ history }: { history: QuoteStatusEventView[] }) {
  const { spacing } = useTheme();
  return (
    <View role="list" style={{ gap: spacing.sm }} testID="quote-history">
      {history.map((event, index) => (
        <View key={`${event.at}-${index}`} role="listitem">
          <ThemedText type="bodyStrong">
            {event.from ? `${STATUS_LABELS[event.from]} → ` : ''}
            {STATUS_LABELS[event.to]}
          </ThemedText>
          <ThemedText type="caption" color="textMuted">
            {event.actor.name} · {formatDateTime(event.at)}
            {event.note ? ` · ${event.note}` : ''}
          </ThemedText>
        </View>
      ))}
    </View>
  );
}
