import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

export default function QuotesScreen() {
  return (
    <Screen>
      <ThemedText type="title">Quotes</ThemedText>
      <ThemedText>
        The service desk will find its customers here and turn a rider&apos;s result into a priced
        spring-swap quote the rider can accept.
      </ThemedText>
    </Screen>
  );
}
