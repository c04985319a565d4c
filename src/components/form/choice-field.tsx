import { useField } from 'formik';

import { SegmentedChoice, type Choice } from '@/components/ui/segmented-choice';

import { FormField } from './form-field';

export type ChoiceFieldProps<T extends string> = {
  name: string;
  label: string;
  hint?: string;
  options: readonly Choice<T>[];
};

/** One of a few options, bound to the enclosing Formik form by name. */
export function ChoiceField<T extends string>({ name, label, hint, options }: ChoiceFieldProps<T>) {
  const [field, meta, helpers] = useField<T | undefined>(name);
  const error = meta.touched ? meta.error : undefined;
  return (
    <FormField label={label} hint={hint} error={error}>
      {() => (
        <SegmentedChoice
          label={label}
          options={options}
          value={field.value}
          invalid={Boolean(error)}
          onChange={(value) => {
            void helpers.setValue(value);
            void helpers.setTouched(true, false);
          }}
        />
      )}
    </FormField>
  );
}
