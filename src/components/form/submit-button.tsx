import { useFormikContext } from 'formik';

import { Button } from '@/components/ui/button';

export type SubmitButtonProps = {
  label: string;
  /** Shown while the form is on its way, e.g. "Signing in…". */
  busyLabel?: string;
};

/** Submits the enclosing Formik form; disabled while a submit is under way. */
export function SubmitButton({ label, busyLabel = label }: SubmitButtonProps) {
  const { isSubmitting, submitForm } = useFormikContext();
  return (
    <Button
      label={isSubmitting ? busyLabel : label}
      disabled={isSubmitting}
      aria-busy={isSubmitting}
      onPress={() => void submitForm()}
    />
  );
}
