import { useField } from 'formik';

import { Form } from '@/components/form/form';
import { FormField } from '@/components/form/form-field';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { identifySchema, type IdentifyInput } from '@shared/schemas/catalogue.schema';
import { SHEAR_MODULUS, SPRING_MATERIALS, type SpringMaterial } from '@shared/sizing/helical-spring';
import type { RateUnit } from '@shared/units';

import { withBlankNumbers } from './blank-numbers';
import { ChipChoice } from './chip-choice';

const schema = withBlankNumbers(identifySchema, ['activeCoils', 'totalCoils'], undefined);
const MATERIAL_CHOICES = SPRING_MATERIALS.map((value) => ({ value, label: SHEAR_MODULUS[value].label }));

export type IdentifyFormProps = { unit: RateUnit; onIdentify: (input: IdentifyInput) => Promise<void> };

/** The measurements of an unlabelled spring, in mm; the rate comes back in the person's unit. */
export function IdentifyForm({ unit, onIdentify }: IdentifyFormProps) {
  return (
    <Form
      schema={schema}
      initialValues={{ wireDiameterMm: '', outerDiameterMm: '', activeCoils: '', totalCoils: '', material: 'chrome-silicon' }}
      onSubmit={(values) => onIdentify({ ...values, unit })}
    >
      <TextField name="wireDiameterMm" label="Wire diameter, mm" hint="With a micrometer, on a straight part of the coil." inputMode="decimal" />
      <TextField name="outerDiameterMm" label="Outer diameter, mm" hint="Across the whole coil." inputMode="decimal" />
      <TextField name="activeCoils" label="Active coils" hint="The coils that move; leave empty and give the total instead." inputMode="decimal" />
      <TextField name="totalCoils" label="Total coils" hint="For closed-and-ground ends: two of them are dead." inputMode="decimal" />
      <MaterialField />
      <FormErrorBanner />
      <SubmitButton label="Work out the rate" busyLabel="Working out…" />
    </Form>
  );
}

/** Four materials do not fit a segmented row on a phone: chips that wrap. */
function MaterialField() {
  const [field, meta, helpers] = useField<SpringMaterial>('material');
  return (
    <FormField label="Material" error={meta.touched ? meta.error : undefined}>
      {() => <ChipChoice label="Material" options={MATERIAL_CHOICES} value={field.value} onChange={(value) => void helpers.setValue(value)} />}
    </FormField>
  );
}
