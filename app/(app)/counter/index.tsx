import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

export default function SpringCatalogueScreen() {
  return (
    <Screen>
      <ThemedText type="title">Spring catalogue</ThemedText>
      <ThemedText>
        The parts counter will keep the shop&apos;s spring rates and stock here; every
        recommendation draws its springs from this catalogue.
      </ThemedText>
    </Screen>
  );
}
