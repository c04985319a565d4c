import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

export default function GarageScreen() {
  return (
    <Screen>
      <ThemedText type="title">Garage</ThemedText>
      <ThemedText>
        Your bikes will be listed here, each with its sag measurements and the set-ups worked out
        for it, so you can measure again after a change and compare.
      </ThemedText>
    </Screen>
  );
}
