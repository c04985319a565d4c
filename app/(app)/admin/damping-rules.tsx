import { DamperKindsPanel } from '@/components/damping-rules/damper-kinds-panel';
import { DampingRules } from '@/components/damping-rules/damping-rules';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

/** The symptom-to-change table the test-ride loop reads, and the adjuster kinds its rows name. */
export default function AdminDampingRulesScreen() {
  return (
    <Screen width="table">
      <ThemedText type="title">Damping rules</ThemedText>
      <ShopDataLinks current="/admin/damping-rules" />
      <ThemedText color="textMuted">
        For each symptom a rider reports at an end, the adjusters the loop tries, one change at a time, in this order. Rows are never deleted, since rides
        refer to them: switch one off to stop the loop trying it. Every change is audited.
      </ThemedText>
      <DamperKindsPanel />
      <DampingRules canEdit />
    </Screen>
  );
}
