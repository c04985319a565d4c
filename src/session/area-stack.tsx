import { Redirect, Stack } from 'expo-router';

import { areaHref, mayEnter, type Area } from './access';
import { useSignedInUser } from './session-provider';

/**
 * The navigator of one role's area, for its `_layout.tsx`. Someone whose role may not enter is
 * sent to their own area instead. Only under app/(app), whose layout guarantees a session.
 */
export function AreaStack({ area }: { area: Area }) {
  const { role } = useSignedInUser();
  if (!mayEnter(role, area)) return <Redirect href={areaHref(role)} />;
  return <Stack screenOptions={{ headerShown: false }} />;
}
