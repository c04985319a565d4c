import { Redirect, Stack, useGlobalSearchParams, useSegments } from 'expo-router';

import { LoadingState } from '@/components/ui/loading-state';
import { landingHref } from '@/session/access';
import { useSession } from '@/session/session-provider';

/**
 * Signing in and up are for people without a session: whoever has one (just signed in, or came
 * back with a live cookie) goes on to `next` or to their own area. The password reset stays open
 * either way, since a mailed link may be opened on a device where someone is signed in.
 */
export default function AuthLayout() {
  const { status, user } = useSession();
  const screen = useSegments().at(-1);
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const forNewcomers = screen !== 'reset';

  if (forNewcomers && user) return <Redirect href={landingHref(user.role, next)} />;
  if (forNewcomers && status === 'loading') return <LoadingState label="Checking your session…" />;
  return <Stack screenOptions={{ headerShown: false }} />;
}
