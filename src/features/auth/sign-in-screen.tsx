import { useState } from 'react';
import { router, useLocalSearchParams } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useSubmit } from '@/lib/api/use-submit';
import { safeNext, withNext } from '@/lib/session/next-path';
import { useSession } from '@/lib/session/session-provider';
import { signInRequest } from './api';
import { AuthFrame } from './auth-frame';

export function SignInScreen() {
  const { signIn } = useSession();
  const { next: nextParam } = useLocalSearchParams<{ next?: string }>();
  const next = typeof nextParam === 'string' && nextParam ? nextParam : null;
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const { submit, busy, message, fields } = useSubmit(async () => {
    const answer = await signInRequest({ email, password });
    await signIn(answer);
    router.replace(safeNext(next));
  });
  return (
    <AuthFrame
      title="Sign in"
      footer={[
        { text: 'New here?', href: withNext('/create-account', next), link: 'Create an account' },
        { text: 'Forgot your password?', href: '/forgot-password', link: 'Reset it' },
      ]}
    >
      {message ? <Notice tone="error">{message}</Notice> : null}
      <Field
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        error={fields.email}
        testID="sign-in-email"
      />
      <Field
        label="Password"
        value={password}
        onChangeText={setPassword}
        secureTextEntry
        autoComplete="current-password"
        error={fields.password}
        onSubmitEditing={() => void submit()}
        testID="sign-in-password"
      />
      <Button label="Sign in" busy={busy} onPress={() => void submit()} testID="sign-in-submit" />
    </AuthFrame>
  );
}
