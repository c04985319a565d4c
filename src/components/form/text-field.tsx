import { useField, useFormikContext } from 'formik';
import { memo, useCallback } from 'react';
import type { NativeSyntheticEvent, TextInputSubmitEditingEventData } from 'react-native';

import { Input, type InputProps } from '@/components/ui/input';

import { FormField } from './form-field';

export type TextFieldProps = Omit<InputProps, 'value' | 'onChangeText' | 'invalid' | 'describedBy'> & {
  /** The field's name in the form's values, which is also its name in the shared schema. */
  name: string;
  label: string;
  hint?: string;
};

type SubmitEvent = NativeSyntheticEvent<TextInputSubmitEditingEventData>;

/**
 * A text box bound to the enclosing Formik form by name. Its error shows once the person has left
 * the field or tried to submit, clears as soon as the typing fixes it, and Enter submits the form.
 */
export function TextField({ name, label, hint, onSubmitEditing, ...inputProps }: TextFieldProps) {
  const [field, meta, helpers] = useField<string>(name);
  const { submitForm } = useFormikContext();
  // Formik marks every field touched on a submit, so this also covers an untouched empty field.
  const error = meta.touched ? meta.error : undefined;
  const showsError = Boolean(error);
  // A shown error is checked again as it is typed away, even in a form that checks only on leaving a field.
  const onChangeText = useCallback((text: string) => void helpers.setValue(text, showsError ? true : undefined), [helpers, showsError]);
  const onBlur = useCallback(() => void helpers.setTouched(true), [helpers]);
  const onSubmit = useCallback(
    (event: SubmitEvent) => {
      onSubmitEditing?.(event);
      void submitForm();
    },
    [onSubmitEditing, submitForm],
  );
  return (
    <BoundInput
      {...inputProps}
      label={label}
      hint={hint}
      error={error}
      value={field.value ?? ''}
      onChangeText={onChangeText}
      onBlur={onBlur}
      onSubmitEditing={onSubmit}
    />
  );
}

type BoundInputProps = Omit<InputProps, 'invalid' | 'describedBy'> & { label: string; hint?: string; error?: string };

/**
 * The drawn field. Every field of a Formik form renders again on any change to the form, so this
 * part skips drawing when its own value, error and texts are unchanged: typing into one field of
 * a long form then redraws only that field.
 */
const BoundInput = memo(function BoundInput({ label, hint, error, ...inputProps }: BoundInputProps) {
  return (
    <FormField label={label} hint={hint} error={error}>
      {({ describedBy }) => (
        <Input accessibilityLabel={label} {...inputProps} invalid={Boolean(error)} describedBy={describedBy} />
      )}
    </FormField>
  );
});
