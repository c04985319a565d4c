import { useFormikContext } from 'formik';

import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';

import type { FormStatus } from './apply-server-error';

/** The form's own error (wrong password, too many attempts, no connection), above its button. */
export function FormErrorBanner() {
  const { status } = useFormikContext();
  const error = (status as FormStatus)?.error;
  if (!error) return null;
  return (
    <Card tone="danger" testID="form-error">
      <ThemedText role="alert">{error}</ThemedText>
    </Card>
  );
}
