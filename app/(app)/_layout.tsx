import { Redirect, Stack, usePathname } from 'expo-router';

import { LoadingState } from '@/components/ui/loading-state';
import { signInHref } from '@/session/access';
import { useSession } from '@/session/session-provider';

/**
 * Every area here needs a session. The guard takes the areas out of the navigator until there is
 * one; meanwhile the screen says the session is being restored, and once it is clear there is
 * none the person is sent to sign in, told to come back to this address. Each area's own layout
 * then checks the role.
 */
export default function SignedInLayout() {
  const { status } = useSession();
  const pathname = usePathname();
  return (
    <>
      <Stack screenOptions={{ headerShown: false }}>
        <Stack.Protected guard={status === 'signed-in'}>
          <Stack.Screen name="rider" />
          <Stack.Screen name="desk" />
          <Stack.Screen name="counter" />
          <Stack.Screen name="admin" />
        </Stack.Protected>
      </Stack>
      {status === 'loading' && <LoadingState label="Restoring your session…" />}
      {status === 'signed-out' && <Redirect href={signInHref(pathname)} />}
    </>
  );
}
