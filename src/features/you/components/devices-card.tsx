import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { mutate } from 'swr';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useSession } from '@/lib/session/session-provider';
import { space } from '@/theme/tokens';
import { endAllSessions, endDeviceSession, sessionKeys, useDeviceSessions } from '../api';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** Where the account is signed in, so a forgotten or stolen device can be signed out from here. */
export function DevicesCard() {
  const { signOut } = useSession();
  const { data, error } = useDeviceSessions();
  const ending = useSubmit(async (id: string) => {
    await endDeviceSession(id);
    await mutate(sessionKeys.list);
  });
  const everywhere = useSubmit(async () => {
    await endAllSessions();
    await signOut();
    router.replace('/sign-in');
  });
  return (
    <Card testID="devices-card">
      <Text variant="label" tone="muted">
        SIGNED-IN DEVICES
      </Text>
      {error ? <Notice tone="error">{'The list of devices could not be loaded.'}</Notice> : null}
      {ending.message || everywhere.message ? <Notice tone="error">{ending.message ?? everywhere.message ?? ''}</Notice> : null}
      <View accessibilityRole="list" style={styles.list}>
        {(data?.items ?? []).map((item) => (
          <View key={item.id} accessibilityRole={'listitem' as never} style={styles.row}>
            <View style={styles.text}>
              <Text>{item.current ? `${item.device} (this device)` : item.device}</Text>
              <Text variant="caption" tone="muted">{`Signed in ${when(item.createdAt)} · last used ${when(item.lastUsedAt)}`}</Text>
            </View>
            {item.current ? null : (
              <Button compact kind="secondary" label="Sign out" accessibilityLabel={`Sign out ${item.device}`} busy={ending.busy} onPress={() => void ending.submit(item.id)} />
            )}
          </View>
        ))}
      </View>
      <Button kind="secondary" label="Sign out everywhere" busy={everywhere.busy} onPress={() => void everywhere.submit()} testID="sign-out-everywhere" />
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: space.xs },
});
