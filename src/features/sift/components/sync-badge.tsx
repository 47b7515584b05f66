import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { Notice } from '@/components/ui/notice';
import type { QueueSnapshot, ScanQueue } from '@/lib/storage/scan-queue';
import { useScanQueueSnapshot } from '@/lib/storage/use-scan-queue';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';

/** The badge for the device's queue, following its status itself so Sift doesn't re-render with each note stored. */
export function QueueBadge({ queue }: { queue: ScanQueue | null }) {
  return <SyncBadge snapshot={useScanQueueSnapshot(queue)} onRetry={() => queue?.retryNow()} />;
}

/** Notes the server refused, each with the reason, under Sift's reading. */
export function RefusedNotes({ queue }: { queue: ScanQueue | null }) {
  const { rejected } = useScanQueueSnapshot(queue);
  if (!rejected.length) return null;
  return (
    <Notice tone="error" title="Notes the server refused">
      {rejected.map((item) => `${item.scan.serial}: ${item.error}`).join('\n')}
    </Notice>
  );
}

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
