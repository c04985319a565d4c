import { Formik } from 'formik';
import { View } from 'react-native';

import { applyServerError } from '@/components/form/apply-server-error';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useEngineSettings } from '@/hooks/use-engine-settings';
import { checkEngineSettings } from '@shared/schemas/shop-data.schema';
import type { EngineSettingRow } from '@shared/types/shop-data';
import { useTheme } from '@/theme';

/** Setting keys hold dots, which Formik reads as nesting: the form keys each by its row instead. */
const fieldName = (index: number) => `s${index}`;

function changedValues(settings: EngineSettingRow[], values: Record<string, string>) {
  return Object.fromEntries(
    settings.flatMap((setting, index) => {
      const typed = values[fieldName(index)];
      return typed.trim() !== String(setting.value) ? [[setting.key, typed]] : [];
    }),
  );
}

function SettingsForm({ settings, save }: { settings: EngineSettingRow[]; save: (values: Record<string, number>) => Promise<void> }) {
  const { spacing } = useTheme();
  const initialValues = Object.fromEntries(settings.map((setting, index) => [fieldName(index), String(setting.value)]));
  return (
    <Formik<Record<string, string>>
      initialValues={initialValues}
      enableReinitialize
      validate={(values) => {
        const changed = changedValues(settings, values);
        if (Object.keys(changed).length === 0) return {};
        const check = checkEngineSettings(changed, settings);
        if (check.ok) return {};
        return Object.fromEntries(settings.flatMap((setting, index) => (check.fields[setting.key] ? [[fieldName(index), check.fields[setting.key]]] : [])));
      }}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        const check = checkEngineSettings(changedValues(settings, values), settings);
        if (!check.ok) {
          helpers.setStatus({ error: Object.values(check.fields).join(' ') });
          return;
        }
        try {
          await save(check.values);
        } catch (error) {
          applyServerError(error, values, helpers);
        }
      }}
    >
      <View style={{ gap: spacing.lg }}>
        {settings.map((setting, index) => (
          <TextField
            key={setting.key}
            name={fieldName(index)}
            label={setting.unit ? `${setting.label} (${setting.unit})` : setting.label}
            hint={`${setting.key} · source: ${setting.source}`}
            inputMode="decimal"
          />
        ))}
        <FormErrorBanner />
        <SubmitButton label="Save changed values" busyLabel="Saving…" />
      </View>
    </Formik>
  );
}

/** The engine's tunable values, each with its unit, label and where it comes from. */
export default function EngineSettingsScreen() {
  const { data, error, mutate, save } = useEngineSettings();
  return (
    <Screen>
      <ThemedText type="title">Engine settings</ThemedText>
      <ShopDataLinks current="/admin/engine-settings" />
      <ThemedText color="textMuted">Only the values you change are sent; every change is audited.</ThemedText>
      {error ? (
        <ErrorState title="The settings could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the settings…" />
      ) : (
        <SettingsForm settings={data.settings} save={save} />
      )}
    </Screen>
  );
}
