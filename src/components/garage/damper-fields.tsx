import { FieldArray, getIn, useFormikContext } from 'formik';
import { View } from 'react-native';

import { ChoiceField } from '@/components/form/choice-field';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { DAMPER_FIELDS } from '@shared/schemas/bike.fields';
import { labelsOf, type DamperLabels } from '@shared/setup/damper-words';
import type { DamperUnit } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { newDamperRow, type BikeFormValues, type DamperRow } from './bike-values';

const UNITS: readonly { value: DamperUnit; label: string }[] = [
  { value: 'clicks', label: 'Clicks' },
  { value: 'turns', label: 'Turns' },
];

/** The label from the shop's list; a kind no longer on it by its key. */
function titleOf(kind: string, labels: DamperLabels): string {
  return labels[kind] ?? kind;
}

/** "Rebound: fully open (clicks out)": every adjuster has the same fields, so each names its adjuster. */
function fieldLabel(title: string, field: keyof typeof DAMPER_FIELDS, unit: string): string {
  return `${title}: ${DAMPER_FIELDS[field].label.toLowerCase()} (${unit})`;
}

export type DamperFieldsMode = 'all' | 'settings' | 'spec';

/**
 * One end's damping adjusters on the bike form. 'all': each adjuster's unit, fully-open count,
 * maker's standard, setting now and dyno figure, a way to remove it, and the kinds on the shop's
 * list not yet used, to add. 'settings': only the setting now of each (a bike copied from a
 * model); 'spec': all but the setting. Rows and buttons wrap, so nothing is cut on a 390 px phone.
 */
export function DamperFields({ end, mode }: { end: EndKind; mode: DamperFieldsMode }) {
  const { spacing, colors } = useTheme();
  const { values, errors } = useFormikContext<BikeFormValues>();
  const kinds = useDamperKinds();
  const labels = labelsOf(kinds.data?.kinds ?? []);
  const name = `${end}.dampers`;
  const rows = (getIn(values, name) as DamperRow[] | undefined) ?? [];

  if (mode === 'settings') {
    return (
      <>
        {rows.map((row, index) => (
          <TextField
            key={row.kind}
            name={`${name}.${index}.position`}
            label={fieldLabel(titleOf(row.kind, labels), 'position', `${row.unit} out`)}
            hint={DAMPER_FIELDS.position.help}
            inputMode="decimal"
            testID={`field-${end}-damper-${row.kind}-position`}
          />
        ))}
      </>
    );
  }

  const unused = (kinds.data?.kinds ?? []).filter((kind) => !rows.some((row) => row.kind === kind.key));
  return (
    <FieldArray name={name}>
      {({ push, remove }) => (
        <View style={{ gap: spacing.md }}>
          {rows.length === 0 && <ThemedText color="textMuted">None recorded: add each adjuster this end has.</ThemedText>}
          {rows.map((row, index) => {
            const at = `${name}.${index}`;
            const title = titleOf(row.kind, labels);
            const unit = `${row.unit} out`;
            // The list's own messages (a kind twice, one not on the shop's list) have no field of their own.
            const kindError = getIn(errors, `${at}.kind`) as unknown;
            return (
              <View key={row.kind} testID={`damper-${end}-${row.kind}`} style={{ gap: spacing.sm, borderTopWidth: 1, borderColor: colors.border, paddingTop: spacing.sm }}>
                <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm }}>
                  <ThemedText type="bodyStrong">{title}</ThemedText>
                  <Button variant="secondary" label="Remove" accessibilityLabel={`Remove ${title}`} onPress={() => remove(index)} />
                </View>
                {typeof kindError === 'string' && <ThemedText color="danger">{kindError}</ThemedText>}
                <ChoiceField name={`${at}.unit`} label={`${title}: ${DAMPER_FIELDS.unit.label.toLowerCase()}`} hint={DAMPER_FIELDS.unit.help} options={UNITS} />
                <TextField
                  name={`${at}.maxPosition`}
                  label={fieldLabel(title, 'maxPosition', unit)}
                  hint={DAMPER_FIELDS.maxPosition.help}
                  inputMode="decimal"
                  testID={`field-${end}-damper-${row.kind}-maxPosition`}
                />
                <TextField
                  name={`${at}.standard`}
                  label={fieldLabel(title, 'standard', unit)}
                  hint={DAMPER_FIELDS.standard.help}
                  inputMode="decimal"
                  testID={`field-${end}-damper-${row.kind}-standard`}
                />
                {mode === 'all' && (
                  <TextField
                    name={`${at}.position`}
                    label={fieldLabel(title, 'position', unit)}
                    hint={DAMPER_FIELDS.position.help}
                    inputMode="decimal"
                    testID={`field-${end}-damper-${row.kind}-position`}
                  />
                )}
                <TextField
                  name={`${at}.dampingPerStepNsPerM`}
                  label={fieldLabel(title, 'dampingPerStepNsPerM', 'N s/m')}
                  hint={DAMPER_FIELDS.dampingPerStepNsPerM.help}
                  inputMode="decimal"
                  testID={`field-${end}-damper-${row.kind}-dampingPerStepNsPerM`}
                />
              </View>
            );
          })}
          {kinds.error ? (
            <ThemedText color="danger">The list of adjuster kinds could not be loaded: {kinds.error.message}</ThemedText>
          ) : unused.length > 0 ? (
            <View style={{ gap: spacing.xs }}>
              <ThemedText type="label">Add an adjuster</ThemedText>
              <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
                {unused.map((kind) => (
                  <Button
                    key={kind.key}
                    variant="secondary"
                    label={`+ ${kind.label}`}
                    accessibilityLabel={`Add ${kind.label}`}
                    onPress={() => push(newDamperRow(kind.key))}
                    testID={`add-damper-${end}-${kind.key}`}
                  />
                ))}
              </View>
            </View>
          ) : null}
        </View>
      )}
    </FieldArray>
  );
}
