/** The two ways stock changes at the counter: a delivery received, and a count that corrects the figure. */
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { countSchema, receiveSchema, type CountInput, type ReceiveInput } from '@shared/schemas/catalogue.schema';
import type { StockAnswer } from '@shared/types/catalogue';

export type ReceiveFormProps = {
  onReceive: (input: ReceiveInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

export function ReceiveForm({ onReceive, onDone }: ReceiveFormProps) {
  return (
    <Form
      schema={receiveSchema}
      initialValues={{ quantity: '', reason: '' }}
      onSubmit={async (values, { resetForm }) => {
        onDone(await onReceive(values));
        resetForm();
      }}
    >
      <TextField name="quantity" label="Quantity received" inputMode="numeric" />
      <TextField name="reason" label="Reason" hint="The delivery note or the supplier's order, for the stock history." />
      <FormErrorBanner />
      <SubmitButton label="Receive" busyLabel="Receiving…" />
    </Form>
  );
}

export type CountFormProps = {
  onCount: (input: CountInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

export function CountForm({ onCount, onDone }: CountFormProps) {
  return (
    <Form
      schema={countSchema}
      initialValues={{ counted: '', reason: '' }}
      onSubmit={async (values, { resetForm }) => {
        onDone(await onCount(values));
        resetForm();
      }}
    >
      <TextField name="counted" label="Counted on the shelf" inputMode="numeric" />
      <TextField name="reason" label="Reason for the correction" hint="A stock-take, a damaged spring, a miscount." />
      <FormErrorBanner />
      <SubmitButton label="Record the count" busyLabel="Recording…" />
    </Form>
  );
}
