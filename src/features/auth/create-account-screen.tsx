import { PASSWORD_RULE } from '@shared/contracts/auth';
import { useState } from 'react';
import { router, useLocalSearchParams } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useSubmit } from '@/lib/api/use-submit';
import { safeNext, withNext } from '@/lib/session/next-path';
import { useSession } from '@/lib/session/session-provider';
import { createAccountRequest } from './api';
import { AuthFrame } from './auth-frame';

export function CreateAccountScreen() {
  const { signIn } = useSession();
  const { next: nextParam } = useLocalSearchParams<{ next?: string }>();
  const next = typeof nextParam === 'string' && nextParam ? nextParam : null;
  const [displayName, setDisplayName] = useState('');
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const { submit, busy, message, fields } = useSubmit(async () => {
    const answer = await createAccountRequest({ displayName, email, password });
    await signIn(answer);
    router.replace(safeNext(next));
  });
  return (
    <AuthFrame title="Create an account" footer={[{ text: 'Have an account?', href: withNext('/sign-in', next), link: 'Sign in' }]}>
      {message ? <Notice tone="error">{message}</Notice> : null}
      <Field label="Your name" value={displayName} onChangeText={setDisplayName} autoComplete="name" error={fields.displayName} testID="create-name" />
      <Field
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        error={fields.email}
        testID="create-email"
      />
      <Field
        label="Password"
        value={password}
        onChangeText={setPassword}
        secureTextEntry
        autoComplete="new-password"
        hint={PASSWORD_RULE}
        error={fields.password}
        onSubmitEditing={() => void submit()}
        testID="create-password"
      />
      <Button label="Create account" busy={busy} onPress={() => void submit()} testID="create-submit" />
    </AuthFrame>
  );
}
