import { useFormikContext, getIn } from 'formik';

import { ChoiceField } from '@/components/form/choice-field';
import { TextField } from '@/components/form/text-field';
import { useUnits } from '@/hooks/use-units';
import { displayUnitOf } from '@shared/garage/units';
import { bikeField } from '@shared/schemas/bike.fields';
import { PRELOAD_DIRECTIONS } from '@shared/types/bike';
import type { AdjusterUnit } from '@shared/types/sizing';

const ADJUSTER_UNITS: Record<string, AdjusterUnit> = { threaded: 'turns', stepped: 'steps', spacer: 'mm' };

const CHOICES: Record<string, readonly { value: string; label: string }[]> = {
  kind: [
    { value: 'threaded', label: 'Threaded' },
    { value: 'stepped', label: 'Stepped' },
    { value: 'spacer', label: 'Spacer' },
  ],
  addsPreload: PRELOAD_DIRECTIONS.map((value) => ({ value, label: value })),
};

/** One value of a bike: its label with its unit, the help line from bike.fields.ts, the box. */
export function BikeValueField({ path }: { path: string }) {
  const { units } = useUnits();
  const { values } = useFormikContext();
  const info = bikeField(path);
  const end = path.split('.')[0];
  const adjusterUnit = ADJUSTER_UNITS[getIn(values, `${end}.adjuster.kind`) as string];
  if (info.quantity === 'choice') {
    const options = CHOICES[path.split('.').pop() ?? ''] ?? [];
    return <ChoiceField name={path} label={info.label} hint={info.help} options={options} />;
  }
  const unit = displayUnitOf(info.quantity, units, adjusterUnit);
  return (
    <TextField
      name={path}
      label={unit ? `${info.label} (${unit})` : info.label}
      hint={info.help}
      inputMode={info.quantity === 'text' ? 'text' : 'decimal'}
      testID={`field-${path}`}
    />
  );
}
