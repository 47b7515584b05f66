import { Redirect, Slot } from 'expo-router';
import { useSession } from '@/lib/session/session-provider';

export default function SignedOutLayout() {
  const { ready, user } = useSession();
  if (!ready) return null;
  if (user) return <Redirect href="/sift" />;
  return <Slot />;
}
