import { useState } from 'react';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useBusyAction } from '@/hooks/use-busy-action';
import type { DamperPlan } from '@shared/types/damping';
import type { DamperPlanApplied } from '@shared/types/test-ride';

export type DamperPlanCardProps = {
  /** "Back to the maker's standard" */
  title: string;
  /** Where the plan leads, for the line shown once there: "the maker's standard". */
  targetWords: string;
  plan: DamperPlan;
  /** Logs the plan as followed (one setup-log entry); rejects with the server's reason. */
  onApply: () => Promise<DamperPlanApplied>;
  testID: string;
};

/** One end's way to a target: numbered turns, the adjusters it cannot set, and "Done: log it" once they are made. */
export function DamperPlanCard({ title, targetWords, plan, onApply, testID }: DamperPlanCardProps) {
  const { busy, error, run } = useBusyAction();
  const [done, setDone] = useState<string | null>(null);
  const nothingToSet = plan.atTarget || plan.steps.length === 0;
  return (
    <Card testID={testID}>
      <ThemedText type="bodyStrong">{title}</ThemedText>
      {plan.atTarget ? (
        <ThemedText color="success" testID={`${testID}-at-target`}>
          Already there: every adjuster that has a setting to go back to is at {targetWords}.
        </ThemedText>
      ) : plan.steps.length > 0 ? (
        <>
          <ThemedText>In this order:</ThemedText>
          {plan.steps.map((step, index) => (
            <ThemedText key={step.adjuster} testID={`${testID}-step-${index}`}>
              {index + 1}. {step.instruction}
            </ThemedText>
          ))}
        </>
      ) : null}
      {plan.missing.length > 0 && (
        <>
          <ThemedText type="label">Left as they are</ThemedText>
          {plan.missing.map((line) => (
            <ThemedText key={line} color="textMuted" testID={`${testID}-missing`}>
              {line}
            </ThemedText>
          ))}
        </>
      )}
      {!nothingToSet && (
        <ThemedText type="caption" color="textMuted">
          Turn each adjuster gently in until it stops, then count out; never force one at the stop. Follow the maker’s manual.
        </ThemedText>
      )}
      {done && (
        <ThemedText color="success" testID={`${testID}-done`}>
          {done}
        </ThemedText>
      )}
      {error && (
        <ThemedText color="danger" role="alert">
          {error}
        </ThemedText>
      )}
      <Button
        variant="secondary"
        label={busy ? 'Saving…' : 'Done: log it'}
        accessibilityLabel={`Done: log it (${title})`}
        disabled={busy || nothingToSet}
        onPress={() =>
          void run(async () => {
            const { entry } = await onApply();
            setDone(`${entry.note}: in the setup log.`);
          })
        }
        testID={`${testID}-apply`}
      />
    </Card>
  );
}
