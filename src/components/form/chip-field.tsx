import { useField } from 'formik';

import { ChipChoice } from '@/components/catalogue/chip-choice';
import type { Choice } from '@/components/ui/segmented-choice';

import { FormField } from './form-field';

export type ChipFieldProps<T extends string> = {
  name: string;
  label: string;
  hint?: string;
  options: readonly Choice<T>[];
};

/**
 * One of many options, bound to the enclosing Formik form by name: ChoiceField's segments do not
 * fit a phone beyond three or four options, so these wrap as chips.
 */
export function ChipField<T extends string>({ name, label, hint, options }: ChipFieldProps<T>) {
  const [field, meta, helpers] = useField<T | undefined>(name);
  const error = meta.touched ? meta.error : undefined;
  return (
    <FormField label={label} hint={hint} error={error}>
      {() => (
        <ChipChoice
          label={label}
          options={options}
          value={field.value}
          onChange={(value) => {
            void helpers.setValue(value);
            void helpers.setTouched(true, false);
          }}
        />
      )}
    </FormField>
  );
}
