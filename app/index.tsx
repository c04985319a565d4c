import { ServerStatus } from '@/components/server-status';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';

export default function HomeScreen() {
  return (
    <Screen>
      <ThemedText type="title" testID="home-title">
        Sagwright
      </ThemedText>
      <ThemedText>
        Sagwright measures your motorcycle&apos;s sag with a helper and works out the spring rate
        and preload that suit you, your luggage and the way you ride.
      </ThemedText>
      <SafetyNotice />
      <ServerStatus />
    </Screen>
  );
}
