import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSession } from '@/lib/session/session-provider';
import { useThemeState, type ThemePreference } from '@/theme/theme-provider';
import { space } from '@/theme/tokens';

const THEMES: { value: ThemePreference; label: string }[] = [
  { value: 'system', label: 'Match device' },
  { value: 'light', label: 'Paper' },
  { value: 'dark', label: 'Graphite' },
];

export function YouScreen() {
  const { user, signOut } = useSession();
  const { preference, setPreference } = useThemeState();
  return (
    <Screen title="You" subtitle="Your account, your look, your data.">
      <Card>
        <Text variant="label" tone="muted">
          SIGNED IN AS
        </Text>
        <Text variant="heading">{user?.displayName}</Text>
        <Text tone="muted">{user?.email}</Text>
        {user?.role === 'admin' ? (
          <Button kind="secondary" label="Open the Console" onPress={() => router.push('/console')} />
        ) : null}
      </Card>
      <Card>
        <Text variant="label" tone="muted">
          LOOK
        </Text>
        <View style={styles.row} accessibilityRole="radiogroup">
          {THEMES.map((option) => (
            <Button
              key={option.value}
              compact
              kind={preference === option.value ? 'primary' : 'secondary'}
              label={option.label}
              accessibilityRole="radio"
              accessibilityState={{ checked: preference === option.value }}
              onPress={() => setPreference(option.value)}
            />
          ))}
        </View>
      </Card>
      <ComingNext what="Your data" points={['Export everything as CSV and JSON', 'Import an old log with a preview', 'Delete the account']} />
      <Button kind="danger" label="Sign out" onPress={() => void signOut()} testID="sign-out" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
