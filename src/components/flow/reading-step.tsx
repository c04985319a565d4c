import { Formik, useField } from 'formik';
import { useState } from 'react';
import { View } from 'react-native';

import { FormField } from '@/components/form/form-field';
import { Card } from '@/components/ui/card';
import { Input } from '@/components/ui/input';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { formatQuantity, toFieldText } from '@/components/units/format';
import { useUnits } from '@/hooks/use-units';
import { READING_PITFALLS } from '@shared/sizing';
import type { DraftLengthReading, MeasuringStep } from '@shared/types/garage';
import type { EndKind, LengthReading } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { FlowNav } from './flow-nav';
import { FlowProgress } from './flow-progress';
import { useMeasureFlow } from './measure-context';
import { neighbourStep } from './measure-state';
import { checkReading, fieldOf, readingFrom, type ReadingErrors, type ReadingTexts } from './reading-check';
import { SagDiagram } from './sag-diagram';
import { MARKS, STAGE_TEXTS, type Stage } from './step-texts';

const MODES = [
  { value: 'pair', label: 'Pushed and lifted' },
  { value: 'single', label: 'One reading' },
] as const;

/** One length box; `name` is the Formik path of its text, so a form with several readings can use it too. */
export function ReadingInput({ name, label, error, testID }: { name: string; label: string; error?: string; testID: string }) {
  const [field, meta, helpers] = useField<string>(name);
  // Checked as typed: a wrong value shows at once, an empty box only once the person moved on.
  const shown = field.value !== '' || meta.touched ? error : undefined;
  return (
    <FormField label={label} error={shown}>
      {({ describedBy }) => (
        <Input
          accessibilityLabel={label}
          inputMode="decimal"
          value={field.value}
          onChangeText={(text) => void helpers.setValue(text)}
          onBlur={() => void helpers.setTouched(true)}
          invalid={Boolean(shown)}
          describedBy={describedBy}
          testID={testID}
        />
      )}
    </FormField>
  );
}

function initialTexts(reading: DraftLengthReading | undefined, toText: (mm: number | undefined) => string): ReadingTexts {
  if (typeof reading === 'number') return { value: toText(reading), pushed: '', lifted: '', mode: 'single' };
  return { value: '', pushed: toText(reading?.pushedMm), lifted: toText(reading?.liftedMm), mode: 'pair' };
}

function describeHint(reading: LengthReading | number, format: (mm: number) => string): string {
  if (typeof reading === 'number') return format(reading);
  return `pushed ${format(reading.pushedMm)}, lifted ${format(reading.liftedMm)}`;
}

/** One loaded or extended reading of one end: what to do, where the marks are, the diagram, the boxes. */
export function ReadingStep({ end, stage }: { end: EndKind; stage: Stage }) {
  const { spacing } = useTheme();
  const { units } = useUnits();
  const { bike, state, moveTo } = useMeasureFlow();
  const [busy, setBusy] = useState(false);
  const step = `${end}-${stage}` as MeasuringStep;
  const field = fieldOf(stage);
  const text = STAGE_TEXTS[stage][end];
  const travelMm = end === 'front' ? bike.front?.travelMm : bike.rear?.wheelTravelMm;
  const toText = (mm: number | undefined) => toFieldText(mm, 'length', units);
  const hint = state.hints?.[end]?.[field];
  const previous = neighbourStep(state.answers.ends, step, -1);
  const next = neighbourStep(state.answers.ends, step, 1) ?? 'review';

  const validate = (texts: ReadingTexts, complete: boolean): ReadingErrors =>
    checkReading({ end, field, texts, answers: state.answers, travelMm, units, complete });

  return (
    <Screen>
      <FlowProgress step={step} ends={state.answers.ends} />
      <ThemedText type="title">{text.title}</ThemedText>
      <SagDiagram end={end} stage={stage} />
      <Card>
        <ThemedText>
          <ThemedText type="bodyStrong">You: </ThemedText>
          {text.rider}
        </ThemedText>
        <ThemedText>
          <ThemedText type="bodyStrong">Helper: </ThemedText>
          {text.helper}
        </ThemedText>
        <ThemedText>
          <ThemedText type="bodyStrong">The marks: </ThemedText>
          {MARKS[end]}
        </ThemedText>
        {text.why && (
          <ThemedText color="textMuted">
            <ThemedText type="bodyStrong" color="textMuted">Why two readings: </ThemedText>
            {text.why}
          </ThemedText>
        )}
      </Card>
      {stage !== 'extended' && (
        <Card tone="warning">
          <ThemedText type="bodyStrong">What spoils a reading</ThemedText>
          {READING_PITFALLS.map((pitfall) => (
            <ThemedText key={pitfall}>· {pitfall}</ThemedText>
          ))}
        </Card>
      )}
      {hint !== undefined && (
        <Card tone="success" testID="remeasure-hint">
          <ThemedText>
            Last time: {describeHint(hint, (mm) => formatQuantity(mm, 'length', units))}. After your change the reading should differ.
          </ThemedText>
        </Card>
      )}
      <Formik<ReadingTexts>
        initialValues={initialTexts(state.answers[end]?.[field], toText)}
        validate={(texts) => validate(texts, false)}
        validateOnMount
        onSubmit={async (texts, helpers) => {
          const errors = validate(texts, true);
          if (Object.keys(errors).length > 0) {
            helpers.setErrors(errors);
            await helpers.setTouched({ value: true, pushed: true, lifted: true }, false);
            return;
          }
          setBusy(true);
          try {
            const value = readingFrom(texts, field, units) as DraftLengthReading;
            await moveTo(next, { type: 'reading-taken', end, field, value });
          } finally {
            setBusy(false);
          }
        }}
      >
        {({ values, errors, setFieldValue, submitForm }) => (
          <View style={{ gap: spacing.lg }}>
            {stage === 'extended' ? (
              <ReadingInput name="value" label={`Extended length (${units.length})`} error={errors.value} testID="reading-value" />
            ) : (
              <>
                <SegmentedChoice label="How many readings" options={MODES} value={values.mode} onChange={(mode) => void setFieldValue('mode', mode)} />
                {values.mode === 'pair' ? (
                  <>
                    <ReadingInput name="pushed" label={`After pushing down (${units.length})`} error={errors.pushed} testID="reading-pushed" />
                    <ReadingInput name="lifted" label={`After lifting (${units.length})`} error={errors.lifted} testID="reading-lifted" />
                    {errors.value && (
                      <ThemedText color="danger" role="alert" testID="reading-error">
                        {errors.value}
                      </ThemedText>
                    )}
                  </>
                ) : (
                  <ReadingInput name="value" label={`Length (${units.length})`} error={errors.value} testID="reading-value" />
                )}
              </>
            )}
            <FlowNav
              busy={busy}
              onBack={previous ? () => void moveTo(previous) : undefined}
              onNext={() => void submitForm()}
            />
          </View>
        )}
      </Formik>
    </Screen>
  );
}
