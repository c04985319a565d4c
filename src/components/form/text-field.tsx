import { useField, useFormikContext } from 'formik';

import { Input, type InputProps } from '@/components/ui/input';

import { FormField } from './form-field';

export type TextFieldProps = Omit<InputProps, 'value' | 'onChangeText' | 'invalid' | 'describedBy'> & {
  /** The field's name in the form's values, which is also its name in the shared schema. */
  name: string;
  label: string;
  hint?: string;
};

/**
 * A text box bound to the enclosing Formik form by name. Its error shows once the person has left
 * the field or tried to submit, and Enter submits the form.
 */
export function TextField({ name, label, hint, onSubmitEditing, ...inputProps }: TextFieldProps) {
  const [field, meta, helpers] = useField<string>(name);
  const { submitForm } = useFormikContext();
  // Formik marks every field touched on a submit, so this also covers an untouched empty field.
  const error = meta.touched ? meta.error : undefined;
  return (
    <FormField label={label} hint={hint} error={error}>
      {({ describedBy }) => (
        <Input
          accessibilityLabel={label}
          {...inputProps}
          value={field.value ?? ''}
          onChangeText={(text) => void helpers.setValue(text)}
          onBlur={() => void helpers.setTouched(true)}
          onSubmitEditing={(event) => {
            onSubmitEditing?.(event);
            void submitForm();
          }}
          invalid={Boolean(error)}
          describedBy={describedBy}
        />
      )}
    </FormField>
  );
}
