import { Redirect, Stack, usePathname } from 'expo-router';
import { useState } from 'react';

import { signInHref } from '@/session/access';
import { useSession } from '@/session/session-provider';

/**
 * Every area here needs a session: the guard takes the areas out of the navigator without one,
 * and the person is sent to sign in, told to come back afterwards. Each area's own layout then
 * checks the role. The root layout shows nothing of the app until the session is known.
 */
export default function SignedInLayout() {
  const { status } = useSession();
  const signedIn = status === 'signed-in';
  const pathname = usePathname();
  // Where to come back to. Once the guard has emptied the navigator the path reads as the
  // group's root, so it is remembered from the last render that still showed a screen.
  const [returnTo, setReturnTo] = useState(pathname);
  if (signedIn && pathname !== returnTo) setReturnTo(pathname);

  return (
    <>
      <Stack screenOptions={{ headerShown: false }}>
        <Stack.Protected guard={signedIn}>
          <Stack.Screen name="rider" />
          <Stack.Screen name="desk" />
          <Stack.Screen name="counter" />
          <Stack.Screen name="admin" />
        </Stack.Protected>
      </Stack>
      {!signedIn && <Redirect href={signInHref(returnTo)} />}
    </>
  );
}
