import { Card } from '@/components/ui/card';
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
      <Card>
        <ThemedText type="bodyStrong">Catalogue screens come next</ThemedText>
        <ThemedText color="textMuted">Browsing, stock counts and import are on their way.</ThemedText>
      </Card>
    </Screen>
  );
}
