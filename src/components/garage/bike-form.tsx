import { Formik } from 'formik';
import { useState } from 'react';
import { View } from 'react-native';
import { ValidationError } from 'yup';

import { applyServerError } from '@/components/form/apply-server-error';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useUnits } from '@/hooks/use-units';
import { bikeFormSchema, bikeModelSchema } from '@shared/schemas/bike.schema';
import type { BikeSpec } from '@shared/types/bike';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { BikeValueField } from './bike-value-field';
import { DamperFields } from './damper-fields';
import { FIELD_GROUPS, formToSpec, RIDER_CHANGE_PATHS, specToForm, toFormErrors, type BikeFormValues } from './bike-values';

export type BikeFormProps = {
  spec: Partial<BikeSpec>;
  /** The bike's nickname, or the shop model's name. */
  nickname: string;
  /** A shop model (the admin's catalogue) has a name and a description instead of a nickname. */
  model?: { description: string };
  /** Copied from a shop model: the rider's own changes come first, the rest folded away. */
  fromModel?: boolean;
  submitLabel: string;
  onSubmit: (values: BikeSpec & { nickname: string; description?: string }) => Promise<unknown>;
};

/** The form's spec as the schema of a bike, or of a shop model, wants it. */
function forSchema(spec: ReturnType<typeof formToSpec>, values: BikeFormValues, model: boolean) {
  if (!model) return spec;
  const { nickname, ...rest } = spec;
  return { ...rest, name: nickname, description: values.description };
}

const GROUP_TITLES: Record<string, string> = {
  masses: 'Masses',
  frontGeometry: 'Fork',
  frontSpring: 'Fork spring',
  frontAdjuster: 'Fork preload adjuster',
  rearGeometry: 'Shock and travel',
  rearSpring: 'Shock spring',
  rearAdjuster: 'Shock preload adjuster',
};

const DAMPER_TITLES: Record<EndKind, string> = {
  front: 'Fork damping adjusters (counted out from fully closed)',
  rear: 'Shock damping adjusters (counted out from fully closed)',
};

const YES_NO = [
  { value: 'yes', label: 'Sized' },
  { value: 'no', label: 'Left out' },
] as const;

/** A bike's nickname and values, in the person's units, checked as typed against bikeFormSchema. */
export function BikeForm({ spec, nickname, model, fromModel = false, submitLabel, onSubmit }: BikeFormProps) {
  const schema = model ? bikeModelSchema : bikeFormSchema;
  const { units } = useUnits();
  const { spacing } = useTheme();
  const [showAll, setShowAll] = useState(!fromModel);

  function validate(values: BikeFormValues) {
    try {
      schema.validateSync(forSchema(formToSpec(values, units, spec), values, Boolean(model)), { abortEarly: false });
      return {};
    } catch (error) {
      if (!(error instanceof ValidationError)) throw error;
      const { name, ...errors } = toFormErrors(error);
      return name ? { ...errors, nickname: name } : errors;
    }
  }

  return (
    <Formik<BikeFormValues>
      initialValues={{
        ...specToForm(spec, nickname, units),
        // By hand both ends start sized; the rider leaves one out with its switch.
        ...(!spec.masses && { hasFront: true, hasRear: true }),
        ...(model && { description: model.description }),
      }}
      validate={validate}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          const cast = schema.cast(forSchema(formToSpec(values, units, spec), values, Boolean(model)), { stripUnknown: true });
          await onSubmit({ nickname: values.nickname, ...(cast as unknown as BikeSpec & { description?: string }) });
        } catch (error) {
          applyServerError(error, values, helpers);
        }
      }}
    >
      {({ values, setFieldValue }) => {
        const endSwitch = (end: EndKind) => {
          const key = end === 'front' ? 'hasFront' : 'hasRear';
          return (
            <SegmentedChoice
              label={end === 'front' ? 'Front end' : 'Rear end'}
              options={YES_NO}
              value={values[key] ? 'yes' : 'no'}
              onChange={(value) => void setFieldValue(key, value === 'yes')}
            />
          );
        };
        const groups = (end: EndKind) =>
          Object.keys(FIELD_GROUPS).filter((group) => group.startsWith(end));
        return (
          <View style={{ gap: spacing.lg }}>
            {model ? (
              <>
                <TextField name="nickname" label="Model name" hint="Maker, model and years, as the shop lists it." testID="field-nickname" />
                <TextField name="description" label="Description" hint="What sets it apart (trim, years, fitted options)." multiline />
              </>
            ) : (
              <TextField name="nickname" label="Nickname" hint="What you call this bike, e.g. “the blue one”." testID="field-nickname" />
            )}
            {fromModel && (
              <Card>
                <ThemedText type="heading">Your changes</ThemedText>
                <ThemedText color="textMuted">
                  The values come from the shop’s model. Change what differs on your bike: the springs fitted and where the adjusters are set now.
                </ThemedText>
                {(['front', 'rear'] as const)
                  .filter((end) => values[end === 'front' ? 'hasFront' : 'hasRear'])
                  .map((end) => (
                    <View key={end} style={{ gap: spacing.md }}>
                      {RIDER_CHANGE_PATHS(end).map((path) => (
                        <BikeValueField key={path} path={path} />
                      ))}
                      <DamperFields end={end} mode="settings" />
                    </View>
                  ))}
              </Card>
            )}
            {fromModel && (
              <Button
                variant="secondary"
                label={showAll ? 'Hide the other values' : 'Show every value'}
                onPress={() => setShowAll((shown) => !shown)}
              />
            )}
            {showAll && (
              <>
                <Card>
                  <ThemedText type="heading">{GROUP_TITLES.masses}</ThemedText>
                  {FIELD_GROUPS.masses.map((path) => (
                    <BikeValueField key={path} path={path} />
                  ))}
                </Card>
                {(['front', 'rear'] as const).map((end) => (
                  <Card key={end}>
                    <ThemedText type="heading">{end === 'front' ? 'Front' : 'Rear'}</ThemedText>
                    {endSwitch(end)}
                    {values[end === 'front' ? 'hasFront' : 'hasRear'] && (
                      <>
                        {groups(end).map((group) => (
                          <View key={group} style={{ gap: spacing.md }}>
                            <ThemedText type="overline" color="textMuted">
                              {GROUP_TITLES[group]}
                            </ThemedText>
                            {FIELD_GROUPS[group]
                              .filter((path) => !fromModel || !RIDER_CHANGE_PATHS(end).includes(path))
                              .map((path) => (
                                <BikeValueField key={path} path={path} />
                              ))}
                          </View>
                        ))}
                        <View style={{ gap: spacing.md }}>
                          <ThemedText type="overline" color="textMuted">
                            {DAMPER_TITLES[end]}
                          </ThemedText>
                          {/* From a model the settings are above, under the rider's changes. */}
                          <DamperFields end={end} mode={fromModel ? 'spec' : 'all'} />
                        </View>
                      </>
                    )}
                  </Card>
                ))}
              </>
            )}
            <FormErrorBanner />
            <SubmitButton label={submitLabel} busyLabel="Saving…" />
          </View>
        );
      }}
    </Formik>
  );
}
