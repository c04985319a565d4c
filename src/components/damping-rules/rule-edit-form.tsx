import { View } from 'react-native';

import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { Button } from '@/components/ui/button';
import { dampingRulePatchSchema, type DampingRulePatchInput } from '@shared/schemas/damping.schema';
import type { DamperKind } from '@shared/types/damping';
import type { DampingRuleView } from '@shared/types/test-ride';
import { useTheme } from '@/theme';

import { RuleChangeFields } from './rule-fields';

export type RuleEditFormProps = {
  rule: DampingRuleView;
  kinds: readonly DamperKind[];
  onSave: (id: number, patch: DampingRulePatchInput) => Promise<unknown>;
  onClose: () => void;
};

/**
 * The admin's edit of one row in place. The symptom and end stay as they are: the row sits in
 * their group, and one for another symptom or end is a new row. Switching a row off is the row's
 * own button, since it needs no other field.
 */
export function RuleEditForm({ rule, kinds, onSave, onClose }: RuleEditFormProps) {
  const { spacing } = useTheme();
  return (
    <Form
      schema={dampingRulePatchSchema}
      initialValues={{ adjuster: rule.adjuster, direction: rule.direction, priority: String(rule.priority), why: rule.why, feelFor: rule.feelFor }}
      onSubmit={async (values) => {
        await onSave(rule.id, values);
        onClose();
      }}
    >
      <RuleChangeFields kinds={kinds} current={rule.adjuster} idPrefix={`rule-${rule.id}`} />
      <FormErrorBanner />
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        <SubmitButton label="Save the rule" busyLabel="Saving…" />
        <Button variant="secondary" label="Cancel" onPress={onClose} />
      </View>
    </Form>
  );
}
