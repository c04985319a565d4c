import { Link } from 'expo-router';

import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

export default function NotFoundScreen() {
  return (
    <Screen>
      <ThemedText type="title">Page not found</ThemedText>
      <ThemedText color="textMuted">
        There is nothing at this address. It may have moved, or the link may be incomplete.
      </ThemedText>
      <Link href="/" asChild>
        <Button label="Back to home" />
      </Link>
    </Screen>
  );
}
