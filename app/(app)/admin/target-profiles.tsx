import { View } from 'react-native';

import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useTargetProfiles } from '@/hooks/use-target-profiles';
import { targetProfileUpdateSchema } from '@shared/schemas/shop-data.schema';
import type { EndWindowsPct, TargetProfile } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const text = (window: [number, number]) => window.map(String);

function WindowFields({ end }: { end: 'front' | 'rear' }) {
  const { spacing } = useTheme();
  const pair = (key: keyof EndWindowsPct, label: string) => (
    <View style={{ flexDirection: 'row', gap: spacing.sm }}>
      <View style={{ flex: 1 }}>
        <TextField name={`${end}.${key}[0]`} label={`${label} from (%)`} inputMode="decimal" />
      </View>
      <View style={{ flex: 1 }}>
        <TextField name={`${end}.${key}[1]`} label="to (%)" inputMode="decimal" />
      </View>
    </View>
  );
  return (
    <View style={{ gap: spacing.sm }}>
      <ThemedText type="overline" color="textMuted">
        {end === 'front' ? 'Front' : 'Rear'}, % of travel
      </ThemedText>
      {pair('riderSagPct', 'Rider sag')}
      {pair('staticSagPct', 'Static sag')}
    </View>
  );
}

function ProfileEditor({ profile, save }: { profile: TargetProfile; save: (profile: TargetProfile) => Promise<void> }) {
  return (
    <Card testID={`profile-${profile.discipline}`}>
      <ThemedText type="heading">{profile.label}</ThemedText>
      <Form
        schema={targetProfileUpdateSchema}
        initialValues={{
          label: profile.label,
          note: profile.note,
          front: { riderSagPct: text(profile.front.riderSagPct), staticSagPct: text(profile.front.staticSagPct) },
          rear: { riderSagPct: text(profile.rear.riderSagPct), staticSagPct: text(profile.rear.staticSagPct) },
        }}
        onSubmit={(values) => save({ ...(values as Omit<TargetProfile, 'discipline'>), discipline: profile.discipline })}
      >
        <TextField name="label" label="Label" />
        <TextField name="note" label="Note for riders" multiline />
        <WindowFields end="front" />
        <WindowFields end="rear" />
        <FormErrorBanner />
        <SubmitButton label="Save windows" busyLabel="Saving…" />
      </Form>
    </Card>
  );
}

/** The sag windows the engine aims at, per riding discipline. */
export default function TargetProfilesScreen() {
  const { data, error, mutate, save } = useTargetProfiles();
  return (
    <Screen>
      <ThemedText type="title">Target profiles</ThemedText>
      <ShopDataLinks current="/admin/target-profiles" />
      <ThemedText color="textMuted">Each discipline’s windows for rider and static sag, in % of each end’s travel.</ThemedText>
      {error ? (
        <ErrorState title="The profiles could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the profiles…" />
      ) : (
        data.profiles.map((profile) => <ProfileEditor key={profile.discipline} profile={profile} save={save} />)
      )}
    </Screen>
  );
}
