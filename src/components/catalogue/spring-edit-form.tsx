import { StyleSheet, View } from 'react-native';

import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { useTheme } from '@/theme';
import { springUpdateSchema, type SpringUpdateInput } from '@shared/schemas/catalogue.schema';
import type { SpringAnswer, SpringDetail } from '@shared/types/catalogue';
import { toSi, type RateUnit } from '@shared/units';

import { SpringShopFields, SpringSpecFields } from './spring-fields';
import { springFormSchema } from './spring-form-schema';

const textOf = (value: string | number | null) => (value === null ? '' : String(value));

/** A rate as the box shows it: enough digits for every unit, without float noise. */
const rateText = (value: number | null) => (value === null ? '' : String(Number(value.toFixed(3))));

export type SpringEditFormProps = {
  spring: SpringDetail;
  /** The unit of the spring's `rateInUnit`, in which the rates are typed. */
  unit: RateUnit;
  onSave: (input: SpringUpdateInput) => Promise<SpringAnswer>;
  onDone: () => void;
};

export function SpringEditForm({ spring, unit, onSave, onDone }: SpringEditFormProps) {
  const { spacing } = useTheme();
  const shownRate = rateText(spring.rateInUnit);
  const shownSecondRate = rateText(spring.secondRateInUnit);
  return (
    <Form
      schema={springFormSchema(springUpdateSchema, unit, null)}
      initialValues={{
        sku: spring.sku,
        kind: spring.kind,
        family: spring.family,
        rateNmm: shownRate,
        secondRateNmm: shownSecondRate,
        breakMm: textOf(spring.breakMm),
        freeLengthMm: textOf(spring.freeLengthMm),
        maxDeflectionMm: textOf(spring.maxDeflectionMm),
        innerDiameterMm: textOf(spring.innerDiameterMm),
        outerDiameterMm: textOf(spring.outerDiameterMm),
        wireDiameterMm: textOf(spring.wireDiameterMm),
        bin: textOf(spring.bin),
        supplier: textOf(spring.supplier),
        supplierCode: textOf(spring.supplierCode),
        priceCents: textOf(spring.priceCents),
        costCents: textOf(spring.costCents),
        reorderPoint: textOf(spring.reorderPoint),
      }}
      onSubmit={async (values) => {
        // A rate left as shown was rounded for the box; saving it back would nudge the stored N/mm.
        const untouched = (shown: string, sent: number | null | undefined) => shown !== '' && sent === toSi(Number(shown), unit);
        await onSave({
          ...values,
          rateNmm: untouched(shownRate, values.rateNmm) ? spring.rateNmm : values.rateNmm,
          secondRateNmm: untouched(shownSecondRate, values.secondRateNmm) ? spring.secondRateNmm : values.secondRateNmm,
        });
        onDone();
      }}
    >
      <TextField name="sku" label="SKU" autoCapitalize="characters" autoCorrect={false} />
      <SpringSpecFields unit={unit} />
      <SpringShopFields />
      <FormErrorBanner />
      <View style={[styles.actions, { gap: spacing.md }]}>
        <SubmitButton label="Save" busyLabel="Saving…" />
        <Button variant="secondary" label="Cancel" onPress={onDone} />
      </View>
    </Form>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap' } });
