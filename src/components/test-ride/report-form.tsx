import { useField, useFormikContext } from 'formik';
import { Pressable, StyleSheet, View } from 'react-native';

import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { FormField } from '@/components/form/form-field';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { SYMPTOMS } from '@shared/damping';
import { testRideReportSchema, type TestRideReportInput } from '@shared/schemas/damping.schema';
import type { Symptom, SymptomKey } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { END_WORDS, STRENGTH_CHOICES } from './ride-words';

export type ReportFormProps = {
  /** The ends the bike has; with one, it is chosen already. */
  ends: readonly EndKind[];
  onReport: (input: TestRideReportInput) => Promise<unknown>;
  submitLabel?: string;
};

type ReportValues = { end: EndKind | undefined; symptom: SymptomKey | undefined; strength: string; note: string };

/**
 * What the bike did after a ride: which end, the symptom in the rider's words (only those that end
 * can have), how strongly, and a note. Checked with the server's own schema; the server's messages
 * land under their fields, anything else above the button.
 */
export function ReportForm({ ends, onReport, submitLabel = 'Propose one change' }: ReportFormProps) {
  const initialValues: ReportValues = { end: ends.length === 1 ? ends[0] : undefined, symptom: undefined, strength: 'clear', note: '' };
  return (
    <View testID="ride-report">
      <Form
        schema={testRideReportSchema}
        initialValues={initialValues}
        onSubmit={async (input, helpers) => {
          await onReport(input);
          // The answer shows above; a cleared form is ready for the next report.
          helpers.resetForm();
        }}
      >
        <EndField ends={ends} />
        <SymptomField />
        <ChoiceField
          name="strength"
          label="How strongly?"
          hint="Slight: now and then. Clear: every time. Strong: it gets in the way of riding. A stronger feeling gets a bigger change."
          options={STRENGTH_CHOICES}
        />
        <TextField name="note" label="Note (optional)" hint="Where it happened: the road, the speed, a passenger or luggage." multiline testID="ride-report-note" />
        <FormErrorBanner />
        <SubmitButton label={submitLabel} busyLabel="Working it out…" />
      </Form>
    </View>
  );
}

/** The end; a symptom the new end cannot have is cleared with it, so the list below never shows a stale choice. */
function EndField({ ends }: { ends: readonly EndKind[] }) {
  const [field, meta, helpers] = useField<EndKind | undefined>('end');
  const { values, setFieldValue } = useFormikContext<ReportValues>();
  const error = meta.touched ? meta.error : undefined;
  const label = 'Which end did it?';
  return (
    <FormField label={label} error={error}>
      {() => (
        <SegmentedChoice
          label={label}
          options={ends.map((end) => ({ value: end, label: END_WORDS[end] }))}
          value={field.value}
          invalid={Boolean(error)}
          onChange={(end) => {
            void helpers.setValue(end);
            void helpers.setTouched(true, false);
            const symptom = SYMPTOMS.find((known) => known.key === values.symptom);
            if (symptom && !symptom.ends.includes(end)) void setFieldValue('symptom', undefined, false);
          }}
          testID="ride-report-end"
        />
      )}
    </FormField>
  );
}

function SymptomField() {
  const { spacing } = useTheme();
  const [field, meta, helpers] = useField<SymptomKey | undefined>('symptom');
  const { values, submitCount } = useFormikContext<ReportValues>();
  // Clearing the choice (a new end) drops the key from Formik's values, and with it the touch a submit gives.
  const error = meta.touched || submitCount > 0 ? meta.error : undefined;
  const label = 'What did the bike do?';
  const end = values.end;
  const choices = end ? SYMPTOMS.filter((symptom) => symptom.ends.includes(end)) : [];
  return (
    <FormField label={label} hint={end ? 'Choose the one that fits best.' : 'Choose the end first: each end has its own list.'} error={error}>
      {() =>
        end ? (
          <View role="radiogroup" aria-label={label} style={{ gap: spacing.xs }} testID="ride-report-symptoms">
            {choices.map((symptom) => (
              <SymptomChoice
                key={symptom.key}
                symptom={symptom}
                selected={field.value === symptom.key}
                onChoose={() => {
                  void helpers.setValue(symptom.key);
                  void helpers.setTouched(true, false);
                }}
              />
            ))}
          </View>
        ) : null
      }
    </FormField>
  );
}

/** A whole row to tap: the rider's words, and under them when it happens. */
function SymptomChoice({ symptom, selected, onChoose }: { symptom: Symptom; selected: boolean; onChoose: () => void }) {
  const { colors, radii, sizes, spacing } = useTheme();
  return (
    <Pressable
      role="radio"
      aria-checked={selected}
      aria-label={symptom.words}
      onPress={() => {
        if (!selected) onChoose();
      }}
      testID={`symptom-${symptom.key}`}
      style={({ pressed }) => [
        styles.choice,
        {
          minHeight: sizes.touchTarget,
          gap: spacing.xxs,
          paddingHorizontal: spacing.md,
          paddingVertical: spacing.sm,
          borderRadius: radii.sm,
          borderColor: selected ? colors.text : colors.border,
          backgroundColor: selected ? colors.text : pressed ? colors.accentSoft : colors.surface,
        },
      ]}
    >
      <ThemedText type="label" color={selected ? 'surface' : 'text'} selectable={false}>
        {symptom.words}
      </ThemedText>
      <ThemedText type="caption" color={selected ? 'surface' : 'textMuted'} selectable={false}>
        {symptom.situation}
      </ThemedText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  choice: { borderWidth: 2, justifyContent: 'center' },
});
