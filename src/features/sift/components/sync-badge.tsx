import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import type { QueueSnapshot } from '@/lib/storage/scan-queue';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';

/** All saved / n waiting / offline: the hunter always knows whether the server has every note. */
export function SyncBadge({ snapshot, onRetry }: { snapshot: QueueSnapshot; onRetry(): void }) {
  const theme = useTheme();
  const { status, waiting } = snapshot;
  const text =
    status === 'saved' ? 'All saved' : status === 'offline' ? `Offline · ${waiting} on this device` : status === 'syncing' ? `Saving ${waiting}…` : `${waiting} waiting`;
  const colour = status === 'saved' ? theme.ok : status === 'offline' ? theme.warn : theme.near;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={`Sync: ${text}. Tap to retry now.`}
      onPress={onRetry}
      testID="sync-badge"
      style={[styles.badge, { borderColor: colour }]}
    >
      <View style={[styles.dot, { backgroundColor: colour }]} />
      <Text variant="caption" style={{ color: colour, fontWeight: '600' }} testID="sync-text">
        {text}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  badge: { flexDirection: 'row', alignItems: 'center', gap: space.xs, borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 3 },
  dot: { width: 7, height: 7, borderRadius: 4 },
});
