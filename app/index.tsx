import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { ServerStatus } from '@/components/server-status';
import { Button } from '@/components/ui/button';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { areaHref } from '@/session/access';
import { useSession } from '@/session/session-provider';
import { useTheme } from '@/theme';

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
      <CallToAction />
      <SafetyNotice />
      <ServerStatus />
    </Screen>
  );
}

/** Into the app: the way to one's own area, or to sign in or up. */
function CallToAction() {
  const { user } = useSession();
  const { spacing } = useTheme();
  return (
    <View style={[styles.row, { gap: spacing.md }]}>
      {user ? (
        <Link href={areaHref(user.role)} asChild>
          <Button label="Go to your area" />
        </Link>
      ) : (
        <>
          <Link href="/sign-in" asChild>
            <Button label="Sign in" />
          </Link>
          <Link href="/sign-up" asChild>
            <Button label="Create an account" variant="secondary" />
          </Link>
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap' },
});
