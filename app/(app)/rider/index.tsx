import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useSignedInUser } from '@/session/session-provider';

export default function GarageScreen() {
  const { name } = useSignedInUser();
  return (
    <Screen>
      <ThemedText type="title">Garage</ThemedText>
      <ThemedText>
        Your bikes will be listed here, {name}, each with its measurements and the set-ups worked
        out for it, so you can measure again after a change and compare.
      </ThemedText>
      <Card>
        <ThemedText type="bodyStrong">No bikes yet</ThemedText>
        <ThemedText color="textMuted">
          Adding a bike and measuring its sag with a helper comes next.
        </ThemedText>
      </Card>
    </Screen>
  );
}
