import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { springCreateSchema, type SpringCreateInput } from '@shared/schemas/catalogue.schema';
import type { SpringAnswer } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { SpringShopFields, SpringSpecFields } from './spring-fields';
import { springFormSchema } from './spring-form-schema';

export type SpringCreateFormProps = {
  /** The person's rate unit, in which both rates are typed. */
  unit: RateUnit;
  onCreate: (input: SpringCreateInput) => Promise<SpringAnswer>;
  onDone: (answer: SpringAnswer) => void;
};

const EMPTY = {
  sku: '',
  kind: undefined,
  family: '',
  rateNmm: '',
  secondRateNmm: '',
  breakMm: '',
  freeLengthMm: '',
  maxDeflectionMm: '',
  innerDiameterMm: '',
  outerDiameterMm: '',
  wireDiameterMm: '',
  supplier: '',
  supplierCode: '',
  costCents: '',
  priceCents: '',
  bin: '',
  reorderPoint: '0',
};

/** A spring typed in by hand; stock is never part of it (the server refuses onHand), it is received afterwards. */
export function SpringCreateForm({ unit, onCreate, onDone }: SpringCreateFormProps) {
  return (
    <Form schema={springFormSchema(springCreateSchema, unit, null)} initialValues={EMPTY} onSubmit={async (values) => onDone(await onCreate(values))}>
      <TextField name="sku" label="SKU" autoCapitalize="characters" autoCorrect={false} />
      <SpringSpecFields unit={unit} />
      <SpringShopFields />
      <FormErrorBanner />
      <SubmitButton label="Add the spring" busyLabel="Adding…" />
    </Form>
  );
}
