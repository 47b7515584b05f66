import { router, useLocalSearchParams } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/lib/api/client';
import { useSubmit } from '@/lib/api/use-submit';
import { withNext } from '@/lib/session/next-path';
import { useSession } from '@/lib/session/session-provider';
import { revalidateHunts } from '../hunts/api';
import { AuthFrame } from '../auth/auth-frame';
import { acceptInvite, useInvitePreview } from './api';
import { formatDate } from '@/lib/format';

const mediumDate = (iso: string) => formatDate(iso, 'medium');

/**
 * Where an invitation mail leads. Signed out, it says what the invitation is and sends the visitor to
 * sign in or create an account, then back here; signed in, one button joins the hunt as crew.
 */
export function InviteScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const code = typeof token === 'string' && token ? token : null;
  const { ready, user } = useSession();
  const preview = useInvitePreview(code);
  const here = code ? `/invite/${code}` : null;
  const joining = useSubmit(async () => {
    if (!code) return;
    const joined = await acceptInvite(code);
    await revalidateHunts();
    router.replace(`/hunts/${joined.huntId}`);
  });

  const invite = preview.data;
  const gone = preview.error instanceof ApiError && (preview.error.status === 404 || preview.error.status === 400);
  return (
    <AuthFrame title="Join a hunt">
      {preview.isLoading || !ready ? <Text tone="muted">Reading the invitation…</Text> : null}
      {gone ? (
        <Notice tone="caution" title="No such invitation">
          This link does not exist, or the owner withdrew it. Ask them for a new one.
        </Notice>
      ) : preview.error ? (
        <Notice tone="error">The invitation could not be read. Check the connection and try again.</Notice>
      ) : null}
      {invite ? (
        <>
          <Text testID="invite-summary">
            {invite.invitedBy} invites you to sift into the hunt “{invite.huntTitle}”. As crew you log your own straps into it; the owner sees every strap
            sheet add up.
          </Text>
          <Text variant="caption" tone="muted">
            Sent to {invite.email} · works until {mediumDate(invite.expiresAt)}
          </Text>
          {invite.status === 'accepted' ? <Notice tone="info">This invitation was already accepted.</Notice> : null}
          {invite.status === 'expired' ? <Notice tone="caution">This invitation has expired; ask the owner for a new one.</Notice> : null}
          {joining.message ? <Notice tone="error">{joining.message}</Notice> : null}
          {ready && user ? (
            <>
              <Text tone="muted">You are signed in as {user.email}.</Text>
              <Button
                label="Join the hunt"
                busy={joining.busy}
                disabled={invite.status === 'expired'}
                onPress={() => void joining.submit()}
                testID="invite-accept"
              />
            </>
          ) : ready ? (
            <>
              <Button label="Sign in to join" onPress={() => router.push(withNext('/sign-in', here))} testID="invite-sign-in" />
              <Button kind="secondary" label="Create an account" onPress={() => router.push(withNext('/create-account', here))} testID="invite-create" />
            </>
          ) : null}
        </>
      ) : null}
    </AuthFrame>
  );
}
