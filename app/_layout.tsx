import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { View } from 'react-native';

import { AppFrame, type NavItem } from '@/components/ui/app-frame';
import { fontFaces, useTheme } from '@/theme';

/** Each role's area adds its entry here once it exists. */
const NAV_ITEMS: readonly NavItem[] = [{ href: '/', label: 'Home' }];

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
    <AppFrame items={NAV_ITEMS}>
      <Slot />
    </AppFrame>
  );
}
