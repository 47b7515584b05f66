import { StyleSheet, View } from 'react-native';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { formatCount as count } from '@/lib/format';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';
import type { ImportOutcome } from '../api';

/** The bar while parts go up, then what the server made of them. */
export function ImportProgress({ progress, outcome }: { progress: { done: number; total: number } | null; outcome: ImportOutcome | null }) {
  const theme = useTheme();
  return (
    <>
      {progress ? (
        <View style={styles.progress} accessibilityRole="progressbar" aria-valuenow={progress.done} aria-valuemax={progress.total} testID="import-progress">
          <View style={[styles.track, { backgroundColor: theme.surfaceSunken, borderColor: theme.line }]}>
            <View style={[styles.fill, { backgroundColor: theme.brand, width: `${(100 * progress.done) / Math.max(1, progress.total)}%` }]} />
          </View>
          <Text variant="caption" tone="muted">
            {count(progress.done)} of {count(progress.total)} rows sent
          </Text>
        </View>
      ) : null}
      {outcome ? (
        <Notice tone={outcome.stored ? 'ok' : 'info'} title="Imported">
          {[
            `${count(outcome.stored)} new ${outcome.stored === 1 ? 'note' : 'notes'}`,
            outcome.duplicates ? `${count(outcome.duplicates)} already in Strapsift` : null,
            outcome.keepers ? `${count(outcome.keepers)} new ${outcome.keepers === 1 ? 'keeper' : 'keepers'}` : null,
            outcome.rejected.length ? `${count(outcome.rejected.length)} refused (${outcome.rejected.slice(0, 3).map((r) => `line ${r.line}: ${r.reason}`).join('; ')})` : null,
          ]
            .filter(Boolean)
            .join(' · ') + (outcome.removedEmptyHunt ? '. Nothing was new, so no hunt was made.' : '.')}
        </Notice>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  progress: { gap: space.xs },
  track: { height: 10, borderRadius: radius.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%' },
});
