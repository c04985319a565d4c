/** The spring's fields, shared by the new-spring form and the edit form on its page. */
import { ChoiceField } from '@/components/form/choice-field';
import { TextField } from '@/components/form/text-field';
import type { SpringKind } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

const KIND_OPTIONS = [
  { value: 'fork', label: 'Fork' },
  { value: 'shock', label: 'Shock' },
] as const satisfies readonly { value: SpringKind; label: string }[];

/** What the maker fixes: kind, fit, rates and sizes. Rates are typed in `unit`, sizes in mm. */
export function SpringSpecFields({ unit }: { unit: RateUnit }) {
  return (
    <>
      <ChoiceField name="kind" label="Kind" options={KIND_OPTIONS} />
      <TextField name="family" label="Family" hint="The fit, such as S56x150 for a 56 mm shock spring 150 mm long." autoCorrect={false} />
      <TextField name="rateNmm" label={`Rate, ${unit}`} inputMode="decimal" />
      <TextField name="secondRateNmm" label={`Second rate, ${unit}`} hint="Progressive springs only, with the break point." inputMode="decimal" />
      <TextField name="breakMm" label="Break point, mm" hint="The compression where the second rate starts." inputMode="decimal" />
      <TextField name="freeLengthMm" label="Free length, mm" inputMode="decimal" />
      <TextField name="maxDeflectionMm" label="Maximum deflection, mm" hint="From free length to coil bind." inputMode="decimal" />
      <TextField name="innerDiameterMm" label="Inner diameter, mm" inputMode="decimal" />
      <TextField name="outerDiameterMm" label="Outer diameter, mm" inputMode="decimal" />
      <TextField name="wireDiameterMm" label="Wire diameter, mm" inputMode="decimal" />
    </>
  );
}

/** What the shop keeps about it: where it comes from, what it costs, where it sits. */
export function SpringShopFields() {
  return (
    <>
      <TextField name="supplier" label="Supplier" />
      <TextField name="supplierCode" label="Supplier's code" autoCorrect={false} />
      <TextField name="costCents" label="Cost, in cents" inputMode="numeric" />
      <TextField name="priceCents" label="Sale price, in cents" hint="1250 is 12.50." inputMode="numeric" />
      <TextField name="bin" label="Bin" autoCorrect={false} />
      <TextField name="reorderPoint" label="Reorder point" hint="0 for a spring not kept in stock." inputMode="numeric" />
    </>
  );
}
