import { FieldArray, Formik, getIn, setIn } from 'formik';
import { View } from 'react-native';
import { ValidationError } from 'yup';

import { applyServerError } from '@/components/form/apply-server-error';
import { ChoiceField } from '@/components/form/choice-field';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { fromFieldText, toFieldText } from '@/components/units/format';
import { useUnits } from '@/hooks/use-units';
import { GEAR_ITEMS_INFO, LOAD_KINDS_INFO, RIDING_POSITIONS_INFO, TYPICAL_VALUES_SOURCE } from '@shared/schemas/weigh-in.fields';
import { weighInSchema } from '@shared/schemas/weigh-in.schema';
import { formatNumber } from '@shared/sizing/format';
import { GEAR_ITEMS, LOAD_KINDS, RIDING_POSITIONS, type DisplayUnits, type LoadKind, type WeighIn } from '@shared/types/garage';
import type { TargetProfile } from '@shared/types/sizing';
import { parseUserNumber } from '@shared/units';
import { useTheme } from '@/theme';

type LoadValues = { kind: LoadKind; massKg: string; rearShare: string };

export type WeighInValues = {
  bodyKg: string;
  gear: Record<string, string>;
  loads: LoadValues[];
  discipline: string;
  position: string;
  rearShare: string;
};

function toValues(weighIn: WeighIn | null, units: DisplayUnits): WeighInValues {
  const gear = Object.fromEntries(
    GEAR_ITEMS.map((item) => [
      item,
      toFieldText(weighIn ? (weighIn.gear[item] ?? 0) : GEAR_ITEMS_INFO[item].typicalKg, 'mass', units),
    ]),
  );
  return {
    bodyKg: toFieldText(weighIn?.bodyKg, 'mass', units),
    gear,
    loads: (weighIn?.loads ?? []).map((load) => ({
      kind: load.kind,
      massKg: toFieldText(load.massKg, 'mass', units),
      rearShare: formatNumber(load.rearShare, 2),
    })),
    discipline: weighIn?.discipline ?? 'road',
    position: weighIn?.position ?? 'neutral',
    rearShare: weighIn ? formatNumber(weighIn.rearShare, 2) : '',
  };
}

function share(text: string): number | string | undefined {
  return text.trim() === '' ? undefined : (parseUserNumber(text) ?? text);
}

function toWeighIn(values: WeighInValues, units: DisplayUnits) {
  return {
    bodyKg: fromFieldText(values.bodyKg, 'mass', units),
    gear: Object.fromEntries(
      Object.entries(values.gear)
        .map(([item, text]) => [item, fromFieldText(text, 'mass', units)] as const)
        .filter(([, value]) => value !== undefined && value !== 0),
    ),
    loads: values.loads.map((load) => ({ kind: load.kind, massKg: fromFieldText(load.massKg, 'mass', units), rearShare: share(load.rearShare) })),
    discipline: values.discipline,
    position: values.position,
    rearShare: share(values.rearShare),
  };
}

export type WeighInFormProps = {
  weighIn: WeighIn | null;
  profiles: TargetProfile[];
  submitLabel: string;
  onSubmit: (weighIn: WeighIn) => Promise<unknown>;
};

/** Body mass, gear item by item, passenger and luggage, discipline and position; checked against weighInSchema. */
export function WeighInForm({ weighIn, profiles, submitLabel, onSubmit }: WeighInFormProps) {
  const { units } = useUnits();
  const { spacing } = useTheme();
  const mass = units.mass;
  return (
    <Formik<WeighInValues>
      initialValues={toValues(weighIn, units)}
      // Checking the whole weigh-in on every keystroke kept a slow phone's typing waiting; a field
      // is checked when it is left and on submit, and again as it is typed into while it shows an error.
      validateOnChange={false}
      validate={(values) => {
        try {
          weighInSchema.validateSync(toWeighIn(values, units), { abortEarly: false });
          return {};
        } catch (error) {
          if (!(error instanceof ValidationError)) throw error;
          let errors = {};
          for (const inner of error.inner) {
            if (inner.path && getIn(errors, inner.path) === undefined) errors = setIn(errors, inner.path, inner.message);
          }
          return errors;
        }
      }}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await onSubmit(weighInSchema.cast(toWeighIn(values, units)) as WeighIn);
        } catch (error) {
          applyServerError(error, values, helpers);
        }
      }}
    >
      {({ values, setFieldValue }) => (
        <View style={{ gap: spacing.lg }}>
          <TextField name="bodyKg" label={`Body mass (${mass})`} hint="On a scale, in light clothes." inputMode="decimal" testID="field-bodyKg" />
          <Card>
            <ThemedText type="heading">Gear worn</ThemedText>
            <ThemedText type="caption" color="textMuted">
              Typical masses ({TYPICAL_VALUES_SOURCE}) to start from: weigh yours and change them. Set 0 for what you do not wear.
            </ThemedText>
            {GEAR_ITEMS.map((item) => (
              <TextField
                key={item}
                name={`gear.${item}`}
                label={`${GEAR_ITEMS_INFO[item].label} (${mass})`}
                hint={GEAR_ITEMS_INFO[item].note}
                inputMode="decimal"
                testID={`field-gear-${item}`}
              />
            ))}
          </Card>
          <Card>
            <ThemedText type="heading">Passenger and luggage</ThemedText>
            <FieldArray name="loads">
              {({ push, remove }) => (
                <View style={{ gap: spacing.md }}>
                  {values.loads.map((load, index) => (
                    <View key={index} style={{ gap: spacing.sm }}>
                      <ChoiceField
                        name={`loads.${index}.kind`}
                        label="What"
                        options={LOAD_KINDS.map((kind) => ({ value: kind, label: LOAD_KINDS_INFO[kind].label }))}
                      />
                      <TextField name={`loads.${index}.massKg`} label={`Mass (${mass})`} inputMode="decimal" />
                      <TextField
                        name={`loads.${index}.rearShare`}
                        label="Share on the rear wheel"
                        hint={LOAD_KINDS_INFO[load.kind].note}
                        inputMode="decimal"
                      />
                      <Button variant="secondary" label="Remove" onPress={() => remove(index)} />
                    </View>
                  ))}
                  <Button
                    variant="secondary"
                    label="Add a passenger or luggage"
                    onPress={() => push({ kind: 'passenger', massKg: '', rearShare: formatNumber(LOAD_KINDS_INFO.passenger.rearShare, 2) })}
                  />
                </View>
              )}
            </FieldArray>
          </Card>
          <ChoiceField
            name="discipline"
            label="How you ride"
            hint={profiles.find((profile) => profile.discipline === values.discipline)?.note}
            options={profiles.map((profile) => ({ value: profile.discipline, label: profile.label }))}
          />
          <ChoiceField
            name="position"
            label="Riding position"
            hint={RIDING_POSITIONS_INFO[values.position as keyof typeof RIDING_POSITIONS_INFO]?.description}
            options={RIDING_POSITIONS.map((position) => ({ value: position, label: RIDING_POSITIONS_INFO[position].label }))}
          />
          <View style={{ gap: spacing.xs }}>
            <TextField
              name="rearShare"
              label="Your weight on the rear wheel (share)"
              hint={`Leave empty for the position’s typical ${formatNumber(RIDING_POSITIONS_INFO[values.position as keyof typeof RIDING_POSITIONS_INFO]?.rearShare ?? 0.65, 2)}.`}
              inputMode="decimal"
            />
            {values.rearShare !== '' && (
              <Button variant="secondary" label="Use the position’s typical share" onPress={() => void setFieldValue('rearShare', '')} />
            )}
          </View>
          <FormErrorBanner />
          <SubmitButton label={submitLabel} busyLabel="Saving…" />
        </View>
      )}
    </Formik>
  );
}
