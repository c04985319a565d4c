import { object, string } from 'yup';

import { ChipField } from '@/components/form/chip-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import type { BikeModel } from '@shared/types/bike';

const addBikeSchema = object({
  modelId: string().required('Choose the shop model.'),
  nickname: string().trim().required('Give the bike a name the customer knows it by.').max(60, 'At most 60 characters.'),
});

/**
 * A customer's bike from one of the shop's stored models, whose spec the sizing then uses. The
 * models wrap as chips: four names already run past a phone's width in one row.
 */
export function AddBikeForm({ models, onAdd }: { models: BikeModel[]; onAdd: (modelId: number, nickname: string) => Promise<unknown> }) {
  const options = models.map((model) => ({ value: String(model.id), label: model.name }));
  return (
    <Form schema={addBikeSchema} initialValues={{ modelId: undefined, nickname: '' }} onSubmit={({ modelId, nickname }) => onAdd(Number(modelId), nickname)}>
      <ChipField name="modelId" label="Shop model" options={options} />
      <TextField name="nickname" label="Bike name" />
      <FormErrorBanner />
      <SubmitButton label="Add the bike" busyLabel="Adding…" />
    </Form>
  );
}
