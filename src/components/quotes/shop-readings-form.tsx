import { Formik, getIn } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ReadingInput } from '@/components/flow/reading-step';
import { SagDiagram } from '@/components/flow/sag-diagram';
import { MARKS, type Stage } from '@/components/flow/step-texts';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import type { DisplayUnits } from '@shared/types/garage';
import type { EndKind, Readings } from '@shared/types/sizing';
import { useLayout, useTheme } from '@/theme';

import { checkShopReadings, emptyShopReadings, shopReadingsFrom, STAGES, type ShopReadingTexts } from './shop-readings';

const END_NAMES: Record<EndKind, string> = { front: 'Fork', rear: 'Shock' };

/** The flow's step titles speak to the rider ("with you aboard"); at the desk the rider is the customer. */
const STAGE_NAMES: Record<Stage, string> = {
  extended: 'fully extended',
  static: 'on its wheels, no rider',
  rider: 'with the rider aboard',
};

const MODES = [
  { value: 'pair', label: 'Pushed and lifted' },
  { value: 'single', label: 'One reading' },
] as const;

type EndChoice = 'both' | EndKind;

const END_CHOICES = [
  { value: 'both', label: 'Both ends' },
  { value: 'front', label: 'Fork only' },
  { value: 'rear', label: 'Shock only' },
] as const;

const endsOfChoice = (choice: EndChoice): EndKind[] => (choice === 'both' ? ['front', 'rear'] : [choice]);

export type ShopReadingsFormProps = {
  /** The ends the bike has. */
  ends: readonly EndKind[];
  travelMm: Partial<Record<EndKind, number>>;
  units: DisplayUnits;
  /** Rejects with the message to show when the sizing was refused. */
  onSave: (readings: Partial<Record<EndKind, Readings>>) => Promise<unknown>;
};

type Values = { choice: EndChoice; texts: ShopReadingTexts };

/**
 * The three lengths of each end of a bike on the bench, on one form: the measuring flow's
 * boxes, marks and diagrams, without its steps, since the shop takes the readings in one go.
 */
export function ShopReadingsForm({ ends, travelMm, units, onSave }: ShopReadingsFormProps) {
  const { spacing } = useTheme();
  const [problem, setProblem] = useState<string | null>(null);
  const initialChoice: EndChoice = ends.length === 2 ? 'both' : ends[0];
  const validate = ({ choice, texts }: Values, complete: boolean) => {
    const errors = checkShopReadings({ ends: endsOfChoice(choice), texts, travelMm, units, complete });
    return Object.keys(errors).length > 0 ? { texts: errors } : {};
  };
  return (
    <Formik<Values>
      initialValues={{ choice: initialChoice, texts: emptyShopReadings() }}
      validate={(values) => validate(values, false)}
      onSubmit={async (values, helpers) => {
        setProblem(null);
        const errors = validate(values, true);
        const readings = shopReadingsFrom(endsOfChoice(values.choice), values.texts, units);
        if (Object.keys(errors).length > 0 || !readings) {
          helpers.setErrors(errors);
          await helpers.setTouched(touchedEverywhere(), false);
          setProblem('Some lengths are missing or do not add up: see the boxes marked.');
          return;
        }
        try {
          await onSave(readings);
        } catch (cause) {
          setProblem(cause instanceof Error ? cause.message : 'The readings could not be sized.');
        }
      }}
    >
      {({ values, errors, isSubmitting, setFieldValue, submitForm }) => (
        <View style={{ gap: spacing.lg }}>
          {ends.length === 2 && (
            <SegmentedChoice
              label="Ends to size"
              options={END_CHOICES}
              value={values.choice}
              onChange={(choice) => void setFieldValue('choice', choice)}
              testID="readings-ends"
            />
          )}
          {endsOfChoice(values.choice).map((end) => (
            <EndReadings key={end} end={end} units={units} values={values.texts} errors={errors} setFieldValue={setFieldValue} />
          ))}
          {problem && (
            <ThemedText role="alert" color="danger" testID="readings-problem">
              {problem}
            </ThemedText>
          )}
          <Button
            label={isSubmitting ? 'Working it out…' : 'Size and save the result'}
            disabled={isSubmitting}
            onPress={() => void submitForm()}
            testID="readings-save"
          />
        </View>
      )}
    </Formik>
  );
}

/** Every box touched, so a save with missing lengths shows each one. */
function touchedEverywhere() {
  const stage = { value: true, pushed: true, lifted: true };
  const end = { extended: stage, static: stage, rider: stage };
  return { texts: { front: end, rear: end } };
}

type EndReadingsProps = {
  end: EndKind;
  units: DisplayUnits;
  values: ShopReadingTexts;
  errors: object;
  setFieldValue: (field: string, value: unknown) => unknown;
};

function EndReadings({ end, units, values, errors, setFieldValue }: EndReadingsProps) {
  const { spacing } = useTheme();
  const { isWide } = useLayout();
  return (
    <Card testID={`readings-${end}`}>
      <ThemedText type="heading">{END_NAMES[end]}</ThemedText>
      <ThemedText color="textMuted">
        <ThemedText type="bodyStrong" color="textMuted">The marks: </ThemedText>
        {MARKS[end]}
      </ThemedText>
      <View style={[isWide && styles.stages, { gap: spacing.lg }]}>
        {STAGES.map((stage) => (
          <View key={stage} style={[isWide && styles.stage, { gap: spacing.sm }]}>
            <StageReading end={end} stage={stage} units={units} mode={values[end][stage].mode} errors={errors} setFieldValue={setFieldValue} />
          </View>
        ))}
      </View>
    </Card>
  );
}

type StageReadingProps = {
  end: EndKind;
  stage: Stage;
  units: DisplayUnits;
  mode: 'pair' | 'single';
  errors: object;
  setFieldValue: (field: string, value: unknown) => unknown;
};

function StageReading({ end, stage, units, mode, errors, setFieldValue }: StageReadingProps) {
  const path = `texts.${end}.${stage}`;
  const error = (key: string): string | undefined => getIn(errors, `${path}.${key}`);
  const title = `${END_NAMES[end]} ${STAGE_NAMES[stage]}`;
  const id = (key: string) => `reading-${end}-${stage}-${key}`;
  return (
    <>
      <ThemedText type="label">{title}</ThemedText>
      <SagDiagram end={end} stage={stage} />
      {stage === 'extended' ? (
        <ReadingInput name={`${path}.value`} label={`${title} (${units.length})`} error={error('value')} testID={id('value')} />
      ) : (
        <>
          <SegmentedChoice
            label={`${title}: how many readings`}
            options={MODES}
            value={mode}
            onChange={(next) => void setFieldValue(`${path}.mode`, next)}
          />
          {mode === 'pair' ? (
            <>
              <ReadingInput name={`${path}.pushed`} label={`${title}, after pushing down (${units.length})`} error={error('pushed')} testID={id('pushed')} />
              <ReadingInput name={`${path}.lifted`} label={`${title}, after lifting (${units.length})`} error={error('lifted')} testID={id('lifted')} />
              {error('value') && (
                <ThemedText color="danger" role="alert">
                  {error('value')}
                </ThemedText>
              )}
            </>
          ) : (
            <ReadingInput name={`${path}.value`} label={`${title} (${units.length})`} error={error('value')} testID={id('value')} />
          )}
        </>
      )}
    </>
  );
}

const styles = StyleSheet.create({
  stages: { flexDirection: 'row', alignItems: 'flex-start' },
  stage: { flex: 1, minWidth: 0 },
});
