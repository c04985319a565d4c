import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { View } from 'react-native';

import { AppFrame } from '@/components/ui/app-frame';
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

/** The frame offers what the session allows; while it is being restored, no destinations yet. */
function FramedApp() {
  const { status, user, signOut } = useSession();
  const items = status === 'loading' ? [] : navItemsFor(user?.role ?? null);
  const account = user ? { name: user.name, role: ROLE_LABELS[user.role], onSignOut: signOut } : undefined;
  return (
    <AppFrame items={items} account={account}>
      <Slot />
    </AppFrame>
  );
}
