import { useFormikContext } from 'formik';
import { useState } from 'react';

import { ChipField } from '@/components/form/chip-field';
import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { ThemedText } from '@/components/ui/themed-text';
import { SYMPTOMS } from '@shared/damping/symptoms';
import { dampingRuleCreateSchema, type DampingRuleCreateInput } from '@shared/schemas/damping.schema';
import type { DamperKind } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import type { DampingRuleView } from '@shared/types/test-ride';

import { RuleChangeFields } from './rule-fields';
import { directionWords, END_WORDS } from './rule-groups';

const SYMPTOM_OPTIONS = SYMPTOMS.map((symptom) => ({ value: symptom.key, label: symptom.words }));

const ENDS: readonly EndKind[] = ['front', 'rear'];

const EMPTY = { symptom: '', end: '', adjuster: '', direction: '', priority: '', why: '', feelFor: '' };

/** The ends offered follow the symptom: "Dives hard under braking" is the fork's alone. */
function EndField() {
  const { values } = useFormikContext<typeof EMPTY>();
  const symptom = SYMPTOMS.find((known) => known.key === values.symptom);
  const ends = symptom ? ENDS.filter((end) => symptom.ends.includes(end)) : ENDS;
  return <ChoiceField name="end" label="End" options={ends.map((end) => ({ value: end, label: END_WORDS[end] }))} />;
}

export type RuleCreateFormProps = {
  kinds: readonly DamperKind[];
  onCreate: (input: DampingRuleCreateInput) => Promise<DampingRuleView>;
};

/**
 * A row of the shop's own. The server makes it active and marks it "added by the shop"; its
 * messages (a kind not on the list, the same move already in the table) land under their fields.
 */
export function RuleCreateForm({ kinds, onCreate }: RuleCreateFormProps) {
  const [added, setAdded] = useState<string | null>(null);
  return (
    <Form
      schema={dampingRuleCreateSchema}
      initialValues={EMPTY}
      onSubmit={async (values, helpers) => {
        setAdded(null);
        const rule = await onCreate(values);
        helpers.resetForm();
        setAdded(`Added to “${rule.symptomWords}”, ${END_WORDS[rule.end].toLowerCase()}: ${rule.adjusterLabel}, ${directionWords(rule.direction)}.`);
      }}
    >
      <ChipField name="symptom" label="Symptom" options={SYMPTOM_OPTIONS} />
      <EndField />
      <RuleChangeFields kinds={kinds} idPrefix="new-rule" />
      <FormErrorBanner />
      <SubmitButton label="Add the rule" busyLabel="Adding…" />
      {added && (
        <ThemedText role="status" testID="rule-added">
          {added}
        </ThemedText>
      )}
    </Form>
  );
}
