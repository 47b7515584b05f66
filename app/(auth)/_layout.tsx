import { Redirect, Slot, useGlobalSearchParams } from 'expo-router';
import { safeNext } from '@/lib/session/next-path';
import { useSession } from '@/lib/session/session-provider';

export default function SignedOutLayout() {
  const { ready, user } = useSession();
  const { next } = useGlobalSearchParams<{ next?: string }>();
  if (!ready) return null;
  // Signed in (or just now): back to where the visitor came from, e.g. an invitation, else the keypad.
  if (user) return <Redirect href={safeNext(next)} />;
  return <Slot />;
}
