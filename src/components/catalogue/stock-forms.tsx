/**
 * How stock changes at the counter: a delivery received, a count that corrects the figure, springs
 * held by name, one hold released by its number, and a quote's hold taken back over the quote.
 */
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import {
  countSchema,
  overrideReleaseSchema,
  receiveSchema,
  releaseSchema,
  reserveSchema,
  type CountInput,
  type OverrideReleaseInput,
  type ReceiveInput,
  type ReleaseInput,
  type ReserveInput,
} from '@shared/schemas/catalogue.schema';
import type { StockAnswer, StockHoldView } from '@shared/types/catalogue';

import { withBlankNumbers } from './blank-numbers';

/** An empty quantity releases all the hold has left. */
const releaseFormSchema = withBlankNumbers(releaseSchema, ['quantity'], undefined);

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

export type HoldFormProps = {
  onHold: (input: ReserveInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

/** Springs put aside by name at the counter; a quote's springs are held by its acceptance instead. */
export function HoldForm({ onHold, onDone }: HoldFormProps) {
  return (
    <Form
      schema={reserveSchema}
      initialValues={{ quantity: '', name: '', reason: '' }}
      onSubmit={async (values, { resetForm }) => {
        onDone(await onHold(values));
        resetForm();
      }}
    >
      <TextField name="quantity" label="Quantity to hold" inputMode="numeric" />
      <TextField name="name" label="Held for" hint="A name, a job or a bike: how the counter will know whose these are." />
      <TextField name="reason" label="Reason" hint="Why they are put aside, for the stock history." />
      <FormErrorBanner />
      <SubmitButton label="Hold" busyLabel="Holding…" />
    </Form>
  );
}

export type ReleaseHoldFormProps = {
  hold: StockHoldView;
  onRelease: (input: ReleaseInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

/** Releases one hold made at the counter, by its number: all of it, or the quantity given. */
export function ReleaseHoldForm({ hold, onRelease, onDone }: ReleaseHoldFormProps) {
  return (
    <Form
      schema={releaseFormSchema}
      initialValues={{ holdId: hold.id, quantity: '', reason: '' }}
      onSubmit={async (values) => onDone(await onRelease(values))}
    >
      <TextField name="quantity" label="Quantity to release" inputMode="numeric" hint={`Leave empty to release all ${hold.quantity}.`} />
      <TextField name="reason" label="Reason for the release" hint="Collected elsewhere, no longer wanted, a mistake." />
      <FormErrorBanner />
      <SubmitButton label={`Release hold #${hold.id}`} busyLabel="Releasing…" />
    </Form>
  );
}

export type OverrideReleaseFormProps = {
  hold: StockHoldView;
  onOverride: (input: OverrideReleaseInput) => Promise<StockAnswer>;
  onDone: (answer: StockAnswer) => void;
};

/** Takes a quote's hold back to the shelf: the quote then shows, to the desk and the rider, that it lost its springs. */
export function OverrideReleaseForm({ hold, onOverride, onDone }: OverrideReleaseFormProps) {
  return (
    <Form
      schema={overrideReleaseSchema}
      initialValues={{ holdId: hold.id, reason: '' }}
      onSubmit={async (values) => onDone(await onOverride(values))}
    >
      <TextField name="reason" label="Why the quote cannot keep them" hint="The desk reads this in the quote's history." />
      <FormErrorBanner />
      <SubmitButton label="Release over the quote" busyLabel="Releasing…" />
    </Form>
  );
}
