import { lazy, Suspense, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useSession } from '@/lib/session/session-provider';
import { useThemeState, type ThemePreference } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { PASSWORD_RULE } from '@shared/contracts/auth';
import { deleteMe, updateMe } from './api';
import { CameraSettingsCard } from '../camera/camera-settings-card';
import { ArchiveExportCard } from './components/archive-export-card';
import { ArchiveRestoreCard } from './components/archive-restore-card';
import { DevicesCard } from './components/devices-card';
import { ExportCard } from './components/export-card';

// The importer brings papaparse and the log checker (about 9 KB gzipped) that few visits need, so it
// loads when You is opened rather than with the app (first-load budget, issue 11).
const ImportCard = lazy(() => import('./components/import-card').then((module) => ({ default: module.ImportCard })));

const THEMES: { value: ThemePreference; label: string }[] = [
  { value: 'system', label: 'Match device' },
  { value: 'light', label: 'Paper' },
  { value: 'dark', label: 'Graphite' },
];

export function YouScreen() {
  const { user, signOut, updateUser } = useSession();
  const { preference, setPreference } = useThemeState();
  const { isWide } = useLayout();
  const [displayName, setDisplayName] = useState(user?.displayName ?? '');
  const [email, setEmail] = useState(user?.email ?? '');
  const [currentPassword, setCurrentPassword] = useState('');
  const [emailPassword, setEmailPassword] = useState('');
  const [newPassword, setNewPassword] = useState('');
  const [confirmText, setConfirmText] = useState('');
  const [done, setDone] = useState<string | null>(null);

  const profile = useSubmit(async () => {
    const emailChanged = email.trim().toLowerCase() !== user?.email;
    const next = await updateMe(emailChanged ? { displayName, email, currentPassword: emailPassword } : { displayName });
    updateUser({ id: next.id, email: next.email, displayName: next.displayName, role: next.role });
    setEmailPassword('');
    setDone(emailChanged ? 'Profile saved. Your other devices were signed out, and your old address got a link to undo the change.' : 'Profile saved.');
  });
  const password = useSubmit(async () => {
    await updateMe({ currentPassword, newPassword });
    setCurrentPassword('');
    setNewPassword('');
    // A new password ends every other session; this device stays signed in.
    setDone('Password changed. Your other devices were signed out.');
  });
  const removal = useSubmit(async () => {
    await deleteMe();
    await signOut();
    router.replace('/sign-in');
  });
  const confirmWord = 'DELETE';

  const account = (
    <Card>
      <Text variant="label" tone="muted">
        PROFILE
      </Text>
      {profile.message ? <Notice tone="error">{profile.message}</Notice> : null}
      {done ? <Notice tone="ok">{done}</Notice> : null}
      <Field label="Name" value={displayName} onChangeText={setDisplayName} error={profile.fields.displayName} testID="you-name" />
      <Field label="E-mail" value={email} onChangeText={setEmail} autoCapitalize="none" keyboardType="email-address" error={profile.fields.email} />
      {email.trim().toLowerCase() !== user?.email ? (
        <Field
          label="Current password"
          value={emailPassword}
          onChangeText={setEmailPassword}
          secureTextEntry
          autoComplete="current-password"
          hint="Needed to change the e-mail."
          error={profile.fields.currentPassword}
          testID="you-email-password"
        />
      ) : null}
      <Button label="Save profile" busy={profile.busy} onPress={() => void profile.submit()} testID="you-save" />
    </Card>
  );

  const passwordCard = (
    <Card>
      <Text variant="label" tone="muted">
        PASSWORD
      </Text>
      {password.message ? <Notice tone="error">{password.message}</Notice> : null}
      <Field label="Current password" value={currentPassword} onChangeText={setCurrentPassword} secureTextEntry autoComplete="current-password" error={password.fields.currentPassword} />
      <Field label="New password" value={newPassword} onChangeText={setNewPassword} secureTextEntry autoComplete="new-password" hint={PASSWORD_RULE} error={password.fields.newPassword} />
      <Button kind="secondary" label="Change password" busy={password.busy} disabled={!currentPassword || !newPassword} onPress={() => void password.submit()} />
    </Card>
  );

  const look = (
    <Card>
      <ChoiceRow label="Look" options={THEMES} value={preference} onChange={(value) => setPreference(value as ThemePreference)} testID="theme-choice" />
      {user?.role === 'admin' ? <Button kind="secondary" label="Open the Console" onPress={() => router.push('/console')} testID="open-console" /> : null}
      <Button kind="secondary" label="Sign out" onPress={() => void signOut()} testID="sign-out" />
    </Card>
  );

  const danger = (
    <Card>
      <Text variant="label" tone="danger">
        DELETE ACCOUNT
      </Text>
      <Text tone="muted">Deletes your hunts, notes, keepers, weights and watch patterns for good. Crew you joined keep their own notes.</Text>
      {removal.message ? <Notice tone="error">{removal.message}</Notice> : null}
      <Field label={`Type ${confirmWord} to confirm`} value={confirmText} onChangeText={setConfirmText} autoCapitalize="characters" testID="delete-confirm" />
      <Button kind="danger" label="Delete my account" busy={removal.busy} disabled={confirmText.trim() !== confirmWord} onPress={() => void removal.submit()} testID="delete-account" />
    </Card>
  );

  const data = (
    <>
      <CameraSettingsCard />
      <ArchiveExportCard />
      <ArchiveRestoreCard />
      <ExportCard />
      <Suspense fallback={null}>
        <ImportCard />
      </Suspense>
    </>
  );

  return (
    <Screen title="You" subtitle={user ? `${user.displayName} · ${user.email}` : undefined}>
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.column}>
            {account}
            {passwordCard}
            <DevicesCard />
          </View>
          <View style={styles.column}>
            {look}
            {data}
            {danger}
          </View>
        </View>
      ) : (
        <>
          {look}
          {account}
          {passwordCard}
          <DevicesCard />
          {data}
          {danger}
        </>
      )}
      <Text variant="caption" tone="faint">
        Values in Strapsift are your own estimates, not appraisals. Keep what you hold, and what cash you carry, private.
      </Text>
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { flex: 1, gap: space.lg },
});
