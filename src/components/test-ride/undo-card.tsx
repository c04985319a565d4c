import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useBusyAction } from '@/hooks/use-busy-action';
import type { TestRideView } from '@shared/types/test-ride';

import { ADJUSTER_CAUTION, END_WORDS } from './ride-words';

export type UndoCardProps = {
  /** A ride judged worse and not taken back: its `undoPlan` counts from where the adjuster is now. */
  ride: TestRideView;
  onUndo: () => Promise<unknown>;
};

/** A change that rode worse, and the turns that take it back; "I've turned it back" logs the undo. */
export function UndoCard({ ride, onUndo }: UndoCardProps) {
  const { busy, error, run } = useBusyAction();
  const plan = ride.undoPlan;
  if (!plan || plan.atTarget) return null;
  return (
    <Card tone="warning" testID={`ride-undo-${ride.id}`}>
      <ThemedText type="overline" color="warning">
        Rode worse · {END_WORDS[ride.end]}
      </ThemedText>
      <ThemedText type="heading">Turn it back</ThemedText>
      <ThemedText>Take the change back before anything else, so the next try starts from where the bike was.</ThemedText>
      {plan.steps.map((step, index) => (
        <ThemedText key={step.adjuster} type="bodyStrong" testID={`ride-undo-step-${index}`}>
          {index + 1}. {step.instruction}
        </ThemedText>
      ))}
      {plan.missing.map((line) => (
        <ThemedText key={line} color="danger">
          {line}
        </ThemedText>
      ))}
      <ThemedText type="caption" color="textMuted">
        {ADJUSTER_CAUTION}
      </ThemedText>
      {error && (
        <ThemedText color="danger" role="alert">
          {error}
        </ThemedText>
      )}
      {plan.steps.length > 0 && (
        <Button
          label={busy ? 'Saving…' : 'I’ve turned it back'}
          disabled={busy}
          onPress={() =>
            void run(async () => {
              await onUndo();
            })
          }
          testID={`ride-undone-${ride.id}`}
        />
      )}
    </Card>
  );
}
