import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card, type CardTone } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { describeDecision } from '@shared/sizing/decision-text';
import type { Certainty, DecisionKind, DecisionText, EndResult } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const TONE: Record<DecisionKind, CardTone> = { keep: 'success', marginal: 'warning', change: 'warning', check: 'danger', none: 'plain' };

/** What kind of answer it is, in a word the headline does not already carry. */
export const DECISION_LABELS: Record<DecisionKind, string> = {
  keep: 'Keep',
  marginal: 'Works, marginal',
  change: 'Change',
  check: 'Check first',
  none: 'No advice',
};

const CERTAINTY_LABELS: Record<Certainty, string> = {
  measured: 'Measured',
  marginal: 'Marginal',
  estimate: 'From the weights',
  bounded: 'Partly measured',
  unsure: 'In doubt',
};

/** The decision's sentences in the person's units; a result made before decisions keeps the sentence it was given. */
export function useDecisionText(result: EndResult): DecisionText {
  const format = useQuantityFormat();
  return result.decision.legacy ? result.decision.text : describeDecision(result.decision, format);
}

/** One end's decision: what to do, in order, how sure it is; the reasons open on demand. */
export function DecisionView({ result, testID }: { result: EndResult; testID: string }) {
  const { spacing } = useTheme();
  const text = useDecisionText(result);
  const [open, setOpen] = useState(false);
  const { kind, certainty } = result.decision;
  return (
    <Card tone={TONE[kind]} testID={testID}>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        <ThemedText type="overline" testID={`${testID}-kind`}>
          {DECISION_LABELS[kind]}
        </ThemedText>
        <ThemedText type="overline" color="textMuted" testID={`${testID}-certainty`}>
          {CERTAINTY_LABELS[certainty]}
        </ThemedText>
      </View>
      <ThemedText type="bodyStrong" testID={`${testID}-headline`}>
        {text.headline}
      </ThemedText>
      {text.steps.length > 0 && (
        <View style={{ gap: spacing.xs }} role="list" testID={`${testID}-steps`}>
          {text.steps.map((step, i) => (
            <View key={step} style={{ flexDirection: 'row', gap: spacing.sm }} role="listitem">
              <ThemedText type="figure">{i + 1}.</ThemedText>
              <ThemedText style={{ flex: 1 }} testID={`${testID}-step-${i}`}>
                {step}
              </ThemedText>
            </View>
          ))}
        </View>
      )}
      {text.damping && (
        <ThemedText color="textMuted" testID={`${testID}-damping`}>
          {text.damping}
        </ThemedText>
      )}
      <ThemedText type="caption" color="textMuted">
        {text.certainty}
      </ThemedText>
      {text.reasons.length > 0 && (
        <View style={{ gap: spacing.xs, alignItems: 'flex-start' }}>
          <Button
            variant="secondary"
            label={open ? 'Hide the reasons' : 'Why'}
            onPress={() => setOpen(!open)}
            aria-expanded={open}
            testID={`${testID}-why`}
          />
          {open && (
            <View style={{ gap: spacing.xs }} testID={`${testID}-reasons`}>
              {text.reasons.map((reason) => (
                <ThemedText key={reason}>· {reason}</ThemedText>
              ))}
            </View>
          )}
        </View>
      )}
    </Card>
  );
}
