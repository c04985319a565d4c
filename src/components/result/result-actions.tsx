import { Link, router } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { stepHref } from '@/components/garage/flow-href';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useStartDraft } from '@/hooks/use-draft';
import { requestQuote } from '@/hooks/use-quote-request';
import { useBusyAction } from '@/hooks/use-busy-action';
import { useSetupChange } from '@/hooks/use-setup-log';
import { describeChange } from '@shared/sizing/adjuster';
import type { SizingRecord } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { preloadUnitsOf } from './end-result-card';

/** What the rider does next: record the preload change, measure again, ask the shop for a quote, print the sheet. */
export function ResultActions({ record }: { record: SizingRecord }) {
  const { spacing } = useTheme();
  const bikeId = record.bikeId;
  const recordChange = useSetupChange(bikeId ?? 0);
  const startDraft = useStartDraft();
  const { busy, error, run } = useBusyAction();
  const [done, setDone] = useState<string | null>(null);
  const [quoteAsked, setQuoteAsked] = useState<string | null>(null);
  // Only a preload the decision tells the rider to set: never one under "check before acting".
  const changed = (['front', 'rear'] as const).filter((end) => {
    const result = record.result[end];
    return result && !result.decision.legacy && result.decision.steps.some((s) => s.kind === 'preload') && preloadUnitsOf(result) !== 0;
  });

  const applyPreload = () =>
    run(async () => {
      const input: Partial<Record<EndKind, { preloadPosition: number }>> = {};
      const parts: string[] = [];
      for (const end of changed) {
        const preload = record.result[end]!.preload!;
        input[end] = { preloadPosition: preload.position };
        parts.push(`${end}: ${describeChange(preload.unit, preloadUnitsOf(record.result[end]!))}`);
      }
      await recordChange({ ...input, note: `Preload as advised (${parts.join('; ')})` });
      setDone('The change is in the setup log. Measure again to see what it gave.');
    });

  const remeasure = () =>
    run(async () => {
      if (!bikeId) return;
      await startDraft(bikeId, true);
      router.push(stepHref(bikeId, 'weigh-in'));
    });

  const askForQuote = () =>
    run(async () => {
      const { quote, created } = await requestQuote(record.id);
      setQuoteAsked(
        created
          ? `The shop has your result: quote ${quote.number} is being prepared and will come to you by e-mail.`
          : `You asked already: quote ${quote.number} for this result is with the shop.`,
      );
    });

  return (
    <Card testID="result-actions">
      <ThemedText type="heading">Next</ThemedText>
      {done && (
        <ThemedText color="success" testID="preload-recorded">
          {done}
        </ThemedText>
      )}
      {quoteAsked && (
        <ThemedText color="success" testID="quote-requested">
          {quoteAsked}
        </ThemedText>
      )}
      {error && (
        <ThemedText color="danger" role="alert">
          {error}
        </ThemedText>
      )}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        {bikeId && changed.length > 0 && !done && (
          <Button label="I changed the preload" disabled={busy} onPress={() => void applyPreload()} testID="apply-preload" />
        )}
        {bikeId && <Button variant="secondary" label="Re-measure after adjusting" disabled={busy} onPress={() => void remeasure()} testID="remeasure" />}
        {bikeId && (
          <Link href={`/rider/bikes/${bikeId}/log`} asChild>
            <Button variant="secondary" label="Setup log" testID="open-log" />
          </Link>
        )}
        {!quoteAsked && (
          <Button variant="secondary" label="Ask the shop for a quote" disabled={busy} onPress={() => void askForQuote()} testID="ask-quote" />
        )}
        <Link href={`/rider/results/${record.id}/sheet`} asChild>
          <Button variant="secondary" label="Setup sheet to print" testID="open-sheet" />
        </Link>
      </View>
    </Card>
  );
}
