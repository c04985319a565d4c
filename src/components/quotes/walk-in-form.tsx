import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { customerCreateSchema } from '@shared/schemas/quote.schema';

/** A rider who walked in, with only what a quote needs: a name and an e-mail to send it to. */
export function WalkInForm({ onCreate }: { onCreate: (input: { name: string; email: string }) => Promise<unknown> }) {
  return (
    <Form schema={customerCreateSchema} initialValues={{ name: '', email: '' }} onSubmit={(values) => onCreate(values)}>
      <TextField name="name" label="Customer name" autoComplete="off" />
      <TextField name="email" label="Customer e-mail" inputMode="email" autoCapitalize="none" autoCorrect={false} autoComplete="off" />
      <FormErrorBanner />
      <SubmitButton label="Add the customer" busyLabel="Adding…" />
    </Form>
  );
}
