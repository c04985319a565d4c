import { Redirect, Slot, useGlobalSearchParams, useSegments } from 'expo-router';

import { landingHref } from '@/session/access';
import { useSession } from '@/session/session-provider';

/**
 * Signing in and up are for people without a session: whoever has one (just signed in, or came
 * back with a live cookie) goes on to `next` or to their own area. The password reset stays open
 * either way, since a mailed link may be opened on a device where someone is signed in. A Slot,
 * not a stack: a form left behind, hidden, would confuse password managers.
 */
export default function AuthLayout() {
  const { user } = useSession();
  const screen = useSegments().at(-1);
  const { next } = useGlobalSearchParams<{ next?: string }>();
  if (user && screen !== 'reset') return <Redirect href={landingHref(user.role, next)} />;
  return <Slot />;
}
