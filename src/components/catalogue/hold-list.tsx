import { useState } from 'react';
import { View } from 'react-native';

import { STATUS_LABELS } from '@/components/quotes/quote-status';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { OverrideReleaseInput, ReleaseInput } from '@shared/schemas/catalogue.schema';
import type { StockAnswer, StockHoldView } from '@shared/types/catalogue';

import { OverrideReleaseForm, ReleaseHoldForm } from './stock-forms';

function holderText(hold: StockHoldView): string {
  const { holder } = hold;
  if (holder.kind === 'manual') return `Held for ${holder.name}`;
  return `Quote ${holder.number}${holder.version > 1 ? ` v${holder.version}` : ''} · ${holder.riderName} · ${STATUS_LABELS[holder.status]}`;
}

export type HoldListProps = {
  holds: readonly StockHoldView[];
  onRelease: (input: ReleaseInput) => Promise<StockAnswer>;
  onOverride: (input: OverrideReleaseInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

/**
 * Who holds the spring's reserved units, oldest first, each with the way to release it: a hold
 * made at the counter by its number; a quote's only over the quote, which then shows the desk and
 * the customer that it lost its springs.
 */
export function HoldList({ holds, onRelease, onOverride, onDone }: HoldListProps) {
  const { colors, spacing } = useTheme();
  const [opened, setOpened] = useState<number>();
  const done = (answer: StockAnswer) => {
    setOpened(undefined);
    onDone(answer);
  };
  return (
    <View role="list" aria-label="Holds">
      {holds.map((hold) => (
        <View
          key={hold.id}
          role="listitem"
          testID={`hold-${hold.id}`}
          style={{ paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border, gap: spacing.xs }}
        >
          <ThemedText type="bodyStrong">{`#${hold.id} · ${holderText(hold)} · ${hold.quantity} held`}</ThemedText>
          <ThemedText type="caption" color="textMuted">
            {`${hold.reason} · ${hold.createdBy?.name ?? 'System'} · ${new Date(hold.createdAt).toLocaleString()}`}
          </ThemedText>
          <View style={{ alignSelf: 'flex-start' }}>
            <Button
              variant="secondary"
              label={hold.holder.kind === 'quote' ? `Release #${hold.id} over the quote…` : `Release #${hold.id}…`}
              onPress={() => setOpened(opened === hold.id ? undefined : hold.id)}
            />
          </View>
          {opened === hold.id &&
            (hold.holder.kind === 'quote' ? (
              <Card tone="warning">
                <ThemedText>
                  {`These springs are quote ${hold.holder.number}'s. Released over the quote, it moves to “${STATUS_LABELS['springs-released']}”: it cannot be fitted, the desk cancels it and refunds any deposit, and the customer sees it on their quote.`}
                </ThemedText>
                <OverrideReleaseForm hold={hold} onOverride={onOverride} onDone={done} />
              </Card>
            ) : (
              <ReleaseHoldForm hold={hold} onRelease={onRelease} onDone={done} />
            ))}
        </View>
      ))}
    </View>
  );
}
