import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { View } from 'react-native';

import { AppFrame } from '@/components/ui/app-frame';
import { LoadingState } from '@/components/ui/loading-state';
import { ROLE_LABELS } from '@/session/access';
import { navItemsFor } from '@/session/nav-items';
import { SessionProvider, useSession } from '@/session/session-provider';
import { fontFaces, useTheme } from '@/theme';

export default function RootLayout() {
  const { colors } = useTheme();
  const [fontsLoaded, fontError] = useFonts({
    [fontFaces.sans]: require('../fonts/Figtree-Regular.ttf'),
    [fontFaces.sansSemiBold]: require('../fonts/Figtree-SemiBold.ttf'),
    [fontFaces.mono]: require('../fonts/AzeretMono-Regular.ttf'),
    [fontFaces.monoMedium]: require('../fonts/AzeretMono-Medium.ttf'),
  });

  // Hold back the first paint until the faces are ready, so text never reflows from a
  // fallback. If loading fails, go on: the theme's fallback stacks keep text legible.
  if (!fontsLoaded && !fontError) {
    return <View style={{ flex: 1, backgroundColor: colors.background }} />;
  }

  return (
    <SessionProvider>
      <FramedApp />
    </SessionProvider>
  );
}

/**
 * The frame offers what the session allows. No screen shows until the session is known: the
 * guards then decide once, and a deep link survives to the screen it names (the navigator would
 * otherwise drop the part of the address it could not show yet).
 */
function FramedApp() {
  const { status, user, signOut } = useSession();
  if (status === 'loading') {
    return (
      <AppFrame items={[]}>
        <LoadingState label="Restoring your session…" />
      </AppFrame>
    );
  }
  const account = user ? { name: user.name, role: ROLE_LABELS[user.role], onSignOut: signOut } : undefined;
  return (
    <AppFrame items={navItemsFor(user?.role ?? null)} account={account}>
      <Slot />
    </AppFrame>
  );
}
