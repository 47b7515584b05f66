import { PASSWORD_RULE } from '@shared/contracts/auth';
import { useState } from 'react';
import { router, useLocalSearchParams } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useSubmit } from '@/lib/api/use-submit';
import { resetPasswordRequest } from './api';
import { AuthFrame } from './auth-frame';

export function ResetPasswordScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const [password, setPassword] = useState('');
  const { submit, busy, message, fields } = useSubmit(async () => {
    await resetPasswordRequest(String(token), password);
    router.replace('/sign-in');
  });
  return (
    <AuthFrame title="Choose a new password" footer={[{ text: 'Back to', href: '/sign-in', link: 'Sign in' }]}>
      {!token ? <Notice tone="error">This page needs the link from your reset e-mail.</Notice> : null}
      {message ? <Notice tone="error">{message}</Notice> : null}
      <Field
        label="New password"
        value={password}
        onChangeText={setPassword}
        secureTextEntry
        autoComplete="new-password"
        hint={PASSWORD_RULE}
        error={fields.password ?? fields.token}
        onSubmitEditing={() => void submit()}
      />
      <Button label="Save new password" busy={busy} disabled={!token} onPress={() => void submit()} />
    </AuthFrame>
  );
}
