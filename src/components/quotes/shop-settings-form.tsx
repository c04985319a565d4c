/**
 * The admin's shop settings as a form. Money and percentages are typed as people say them ("72.00",
 * "20 %") and sent as the integer cents and basis points the API keeps; the shared schema checks the
 * converted values, so the form refuses what the server would.
 */
import { FieldArray, Formik, getIn, setIn, useFormikContext, type FormikErrors } from 'formik';
import { StyleSheet, View } from 'react-native';
import { ValidationError } from 'yup';

import { ApiError } from '@/api/client';
import { applyServerError } from '@/components/form/apply-server-error';
import { ChoiceField } from '@/components/form/choice-field';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import { shopSettingsSchema, type ShopSettingsInput } from '@shared/schemas/shop-settings.schema';
import type { ShopSettingsView } from '@shared/types/quote';

import { formatHundredths, formatPercent, parseBasisPoints, parseCents } from './amounts';

type OperationValues = { code: string; label: string; minutes: string };

type ShopSettingsValues = {
  labourRate: string;
  taxPercent: string;
  depositKind: 'percent' | 'fixed';
  depositPercent: string;
  depositAmount: string;
  operations: OperationValues[];
  quoteValidityDays: string;
  cautions: string;
  publicUrl: string;
};

/** The schema's (and the server's) field paths, as this form names them. */
const FORM_PATHS: Record<string, string> = {
  labourRateCentsPerHour: 'labourRate',
  taxBasisPoints: 'taxPercent',
  'deposit.kind': 'depositKind',
  'deposit.basisPoints': 'depositPercent',
  'deposit.cents': 'depositAmount',
};

function toFormPath(path: string): string {
  return FORM_PATHS[path] ?? path.replace(/\.(\d+)\./g, '[$1].');
}

function settingsToValues(settings: ShopSettingsView): ShopSettingsValues {
  return {
    labourRate: formatHundredths(settings.labourRateCentsPerHour),
    taxPercent: formatPercent(settings.taxBasisPoints),
    depositKind: settings.deposit.kind,
    depositPercent: settings.deposit.kind === 'percent' ? formatPercent(settings.deposit.basisPoints) : '',
    depositAmount: settings.deposit.kind === 'fixed' ? formatHundredths(settings.deposit.cents) : '',
    operations: settings.operations.map((op) => ({ code: op.code, label: op.label, minutes: String(op.minutes) })),
    quoteValidityDays: String(settings.quoteValidityDays),
    cautions: settings.cautions,
    publicUrl: settings.publicUrl ?? '',
  };
}

const wholeNumber = (typed: string) => (/^\d+$/.test(typed.trim()) ? Number(typed.trim()) : Number.NaN);

/** The settings to send, or the errors to show under the fields. */
function valuesToSettings(values: ShopSettingsValues): { settings: ShopSettingsInput } | { errors: FormikErrors<ShopSettingsValues> } {
  let errors: FormikErrors<ShopSettingsValues> = {};
  const labour = parseCents(values.labourRate);
  if (labour === null) errors.labourRate = 'Type the hourly rate as an amount, like 72.00.';
  const tax = parseBasisPoints(values.taxPercent);
  if (tax === null) errors.taxPercent = 'Type the tax rate as a percentage, like 20 or 7.5.';
  const percent = parseBasisPoints(values.depositPercent);
  const amount = parseCents(values.depositAmount);
  if (values.depositKind === 'percent' && percent === null) errors.depositPercent = 'Type the deposit as a percentage, like 25.';
  if (values.depositKind === 'fixed' && amount === null) errors.depositAmount = 'Type the deposit as an amount, like 50.00.';
  const candidate = {
    labourRateCentsPerHour: labour ?? Number.NaN,
    taxBasisPoints: tax ?? Number.NaN,
    deposit: values.depositKind === 'percent' ? { kind: 'percent', basisPoints: percent ?? Number.NaN } : { kind: 'fixed', cents: amount ?? Number.NaN },
    operations: values.operations.map((op) => ({ code: op.code, label: op.label, minutes: wholeNumber(op.minutes) })),
    quoteValidityDays: wholeNumber(values.quoteValidityDays),
    cautions: values.cautions,
    publicUrl: values.publicUrl,
  };
  try {
    const settings = shopSettingsSchema.validateSync(candidate, { abortEarly: false, stripUnknown: true });
    if (Object.keys(errors).length === 0) return { settings };
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    for (const inner of error.inner) {
      const path = toFormPath(inner.path ?? '');
      // A typed value that could not be read keeps its own message over the schema's.
      if (path && getIn(errors, path) === undefined) errors = setIn(errors, path, inner.message);
    }
  }
  return { errors };
}

const DEPOSIT_KINDS = [
  { value: 'percent', label: 'Percentage' },
  { value: 'fixed', label: 'Fixed sum' },
] as const;

function OperationList() {
  const { spacing } = useTheme();
  const { values, errors } = useFormikContext<ShopSettingsValues>();
  const listError = typeof errors.operations === 'string' ? errors.operations : undefined;
  return (
    <FieldArray name="operations">
      {(helpers) => (
        <View style={{ gap: spacing.md }} testID="operation-list">
          <ThemedText type="heading">Labour operations</ThemedText>
          {values.operations.map((_, index) => (
            <Card key={index} testID={`operation-${index}`}>
              <View style={[styles.row, { gap: spacing.md }]}>
                <View style={styles.grow}>
                  <TextField name={`operations[${index}].code`} label={`Operation ${index + 1} code`} autoCapitalize="none" />
                </View>
                <View style={styles.grow}>
                  <TextField name={`operations[${index}].label`} label={`Operation ${index + 1} name`} />
                </View>
                <View style={styles.grow}>
                  <TextField name={`operations[${index}].minutes`} label={`Operation ${index + 1} standard minutes`} inputMode="numeric" />
                </View>
              </View>
              <Button label={`Remove operation ${index + 1}`} variant="secondary" onPress={() => helpers.remove(index)} />
            </Card>
          ))}
          {listError && (
            <ThemedText role="alert" color="danger">
              {listError}
            </ThemedText>
          )}
          <Button label="Add an operation" variant="secondary" onPress={() => helpers.push({ code: '', label: '', minutes: '' })} />
        </View>
      )}
    </FieldArray>
  );
}

function DepositField() {
  const { values } = useFormikContext<ShopSettingsValues>();
  return values.depositKind === 'percent' ? (
    <TextField name="depositPercent" label="Deposit (% of the total)" inputMode="decimal" />
  ) : (
    <TextField name="depositAmount" label="Deposit (fixed sum)" inputMode="decimal" />
  );
}

export function ShopSettingsForm({ settings, save }: { settings: ShopSettingsView; save: (settings: ShopSettingsInput) => Promise<void> }) {
  const { spacing } = useTheme();
  return (
    <Formik<ShopSettingsValues>
      initialValues={settingsToValues(settings)}
      enableReinitialize
      validate={(values) => {
        const result = valuesToSettings(values);
        return 'errors' in result ? result.errors : {};
      }}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        const result = valuesToSettings(values);
        if ('errors' in result) return;
        try {
          await save(result.settings);
        } catch (error) {
          if (error instanceof ApiError && error.fields) {
            // The server names fields as the schema does; each goes under this form's own field.
            let errors: FormikErrors<ShopSettingsValues> = {};
            for (const [path, message] of Object.entries(error.fields)) errors = setIn(errors, toFormPath(path), message);
            helpers.setErrors(errors);
            helpers.setStatus({ error: error.message });
          } else {
            applyServerError(error, values, helpers);
          }
        }
      }}
    >
      <View style={{ gap: spacing.lg }}>
        <TextField name="labourRate" label="Labour rate per hour" hint="In the shop's currency, like 72.00." inputMode="decimal" />
        <TextField name="taxPercent" label="Tax rate (%)" hint="Like 20 or 7.5." inputMode="decimal" />
        <ChoiceField name="depositKind" label="Deposit" options={DEPOSIT_KINDS} />
        <DepositField />
        <OperationList />
        <TextField name="quoteValidityDays" label="Quotes are valid for (days)" inputMode="numeric" />
        <TextField name="cautions" label="Cautions printed on every quote" multiline />
        <TextField
          name="publicUrl"
          label="Public web address"
          hint="Where riders open Sagwright, like https://shop.example: links in reset and quote mails start with it (SAGWRIGHT_PUBLIC_URL on the server wins). Empty: the server's own address, and in production no such mail is sent."
          inputMode="url"
          autoCapitalize="none"
          autoCorrect={false}
        />
        <FormErrorBanner />
        <SubmitButton label="Save the shop settings" busyLabel="Saving…" />
      </View>
    </Formik>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 140 },
});
