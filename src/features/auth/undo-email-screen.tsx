import { router, useLocalSearchParams } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { undoEmailChangeRequest } from './api';
import { AuthFrame } from './auth-frame';

/** Opened from the mail sent to the old address after an e-mail change. */
export function UndoEmailScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const { submit, busy, message, fields } = useSubmit(async () => {
    const answer = await undoEmailChangeRequest(String(token));
    // The account is back on this address and every sign-in ended; a new password finishes the job.
    router.replace(`/reset-password?token=${encodeURIComponent(answer.resetToken)}`);
  });
  return (
    <AuthFrame title="Undo the e-mail change" footer={[{ text: 'Back to', href: '/sign-in', link: 'Sign in' }]}>
      {!token ? <Notice tone="error">This page needs the link from the mail about the change.</Notice> : null}
      {message ? <Notice tone="error">{fields.token ? `This link ${fields.token}.` : message}</Notice> : null}
      <Text>Your account comes back to this address, every device is signed out, and you choose a new password next.</Text>
      <Button label="Undo the change" busy={busy} disabled={!token} onPress={() => void submit()} testID="undo-email" />
    </AuthFrame>
  );
}
