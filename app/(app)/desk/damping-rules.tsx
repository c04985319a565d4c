import { DampingRules } from '@/components/damping-rules/damping-rules';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

/** The symptom-to-change table for the shop's technicians: read it, and add the shop's own rows. */
export default function DeskDampingRulesScreen() {
  return (
    <Screen width="table">
      <ThemedText type="title">Damping rules</ThemedText>
      <ThemedText color="textMuted">
        For each symptom a rider reports at an end, the adjusters the test-ride loop tries, one change at a time, in this order. Add a row of the
        shop’s own below; the admin edits rows and switches them off.
      </ThemedText>
      <DampingRules canEdit={false} />
    </Screen>
  );
}
