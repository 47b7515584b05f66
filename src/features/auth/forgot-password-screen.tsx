import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useSubmit } from '@/lib/api/use-submit';
import { forgotPasswordRequest } from './api';
import { AuthFrame } from './auth-frame';

export function ForgotPasswordScreen() {
  const [email, setEmail] = useState('');
  const [sent, setSent] = useState(false);
  const { submit, busy, message, fields } = useSubmit(async () => {
    await forgotPasswordRequest(email);
    setSent(true);
  });
  return (
    <AuthFrame title="Reset your password" footer={[{ text: 'Remembered it?', href: '/sign-in', link: 'Sign in' }]}>
      {sent ? (
        <Notice tone="ok" title="Check your mail">
          If an account uses that address, a reset link is on its way. The link works once and expires in an hour.
        </Notice>
      ) : null}
      {message ? <Notice tone="error">{message}</Notice> : null}
      <Field
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        error={fields.email}
        onSubmitEditing={() => void submit()}
        testID="forgot-email"
      />
      <Button label="Send reset link" busy={busy} onPress={() => void submit()} testID="forgot-submit" />
    </AuthFrame>
  );
}
