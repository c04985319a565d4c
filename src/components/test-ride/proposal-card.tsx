import { useState } from 'react';
import { View } from 'react-native';

import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useBusyAction } from '@/hooks/use-busy-action';
import { STEP_RULE_TEXT } from '@shared/damping';
import { testRideOutcomeSchema, type TestRideOutcomeInput } from '@shared/schemas/damping.schema';
import type { DamperKind } from '@shared/types/damping';
import type { TestRideView } from '@shared/types/test-ride';
import { useTheme } from '@/theme';

import { ADJUSTER_CAUTION, describeProposal, END_WORDS, OUTCOME_CHOICES } from './ride-words';

export type ProposalCardProps = {
  /** The open ride: its change waits to be made (to-make) or judged (to-judge). */
  ride: TestRideView;
  kinds?: readonly DamperKind[];
  onMade: () => Promise<unknown>;
  onOutcome: (input: TestRideOutcomeInput) => Promise<unknown>;
};

/**
 * What to do now: the one change in big words (which adjuster, which way, how far, from and to),
 * why, what to feel for and any end-stop warning; then "I made this change" while it waits to be
 * made, and how it rode once it is.
 */
export function ProposalCard({ ride, kinds, onMade, onOutcome }: ProposalCardProps) {
  const { spacing } = useTheme();
  const [showRule, setShowRule] = useState(false);
  const { busy, error, run } = useBusyAction();
  if (ride.proposal.kind !== 'change') return null;
  const { change } = ride.proposal;
  const words = describeProposal(change, kinds);
  const toMake = ride.status === 'to-make';
  const toJudge = ride.status === 'to-judge';

  return (
    <Card testID="ride-proposal">
      <ThemedText type="overline" color="accent">
        {toMake ? 'Try this one change' : 'Changed: now ride'} · {END_WORDS[ride.end]}
      </ThemedText>
      <ThemedText color="textMuted">
        For “{ride.symptom.words}” ({ride.strength})
      </ThemedText>
      <View style={{ gap: spacing.xxs }}>
        <ThemedText type="heading" testID="proposal-adjuster">
          {words.adjuster}
        </ThemedText>
        {/* Each on its own line: a phone then never breaks "2 clicks" from its way. */}
        <ThemedText type="title" testID="proposal-way">
          {words.way}
        </ThemedText>
        <ThemedText type="title" color="accent" testID="proposal-amount">
          {words.amount}
        </ThemedText>
        <ThemedText type="bodyStrong" testID="proposal-from-to">
          {words.fromTo}
        </ThemedText>
      </View>
      {change.endStopWarning && (
        <Card tone="warning" testID="proposal-end-stop">
          <ThemedText>{change.endStopWarning}</ThemedText>
        </Card>
      )}
      <View style={{ gap: spacing.xxs }}>
        <ThemedText type="label">Why</ThemedText>
        <ThemedText testID="proposal-why">{change.why}</ThemedText>
      </View>
      <View style={{ gap: spacing.xxs }}>
        <ThemedText type="label">Feel for on the next ride</ThemedText>
        <ThemedText testID="proposal-feel-for">{change.feelFor}</ThemedText>
      </View>
      <Button
        variant="secondary"
        label={showRule ? 'Hide how far a change goes' : 'How far does a change go?'}
        onPress={() => setShowRule((shown) => !shown)}
        testID="proposal-step-rule-toggle"
      />
      {showRule && (
        <ThemedText color="textMuted" testID="proposal-step-rule">
          {STEP_RULE_TEXT}
        </ThemedText>
      )}
      <ThemedText type="caption" color="textMuted">
        {ADJUSTER_CAUTION}
      </ThemedText>
      {error && (
        <ThemedText color="danger" role="alert">
          {error}
        </ThemedText>
      )}
      {toMake && (
        <>
          <ThemedText>Make it, then say so: the change goes in the setup log, so it can be undone.</ThemedText>
          <Button label={busy ? 'Saving…' : 'I made this change'} disabled={busy} onPress={() =>
              void run(async () => {
                await onMade();
              })
            } testID="ride-made" />
        </>
      )}
      {toJudge && <OutcomeForm onOutcome={onOutcome} />}
    </Card>
  );
}

function OutcomeForm({ onOutcome }: { onOutcome: ProposalCardProps['onOutcome'] }) {
  return (
    <View testID="ride-outcome">
      <Form schema={testRideOutcomeSchema} initialValues={{ outcome: undefined, note: '' }} onSubmit={onOutcome}>
        <ThemedText type="heading">How did it ride?</ThemedText>
        <ThemedText color="textMuted">Ride the same roads as before, then compare.</ThemedText>
        <ChoiceField name="outcome" label="Compared with before the change" options={OUTCOME_CHOICES} />
        <TextField name="note" label="Note (optional)" hint="What you felt and where." multiline testID="ride-outcome-note" />
        <FormErrorBanner />
        <SubmitButton label="Save how it rode" busyLabel="Saving…" />
      </Form>
    </View>
  );
}
