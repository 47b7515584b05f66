import { StyleSheet, View } from 'react-native';
import type { ReadingView } from '@shared/contracts';
import { PATTERN_NAMES, type Reading } from '@shared/engine';
import { Badge } from '@/components/ui/badge';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';
import { nearMissLines } from '../../sift/reading-view';
import { formatCount, formatOneIn } from '@/lib/format';

/** The server's reading of a keeper's serial: patterns, odds, near misses and the trade notes that apply. */
export function KeeperReading({ reading }: { reading: ReadingView }) {
  // The contract sends an infinite "1 in" as null; the engine's helpers only read the finite fields here.
  const asEngine = reading as unknown as Reading;
  const misses = nearMissLines(asEngine);
  return (
    <View style={styles.wrap} testID="keeper-reading">
      <View style={styles.badges}>
        {reading.patterns.length ? reading.patterns.map((id) => <Badge key={id} label={PATTERN_NAMES[id]} tone="hit" />) : <Badge label="no pattern" />}
        {reading.star ? <Badge label="★ star" tone="hit" /> : null}
      </View>
      <Text>
        {reading.score.points} points · {reading.score.suggestion}
      </Text>
      {reading.odds.combination ? (
        <Text tone="muted">
          {formatOneIn(reading.odds.combination.oneIn ?? Infinity)} serials has{' '}
          {reading.odds.combination.ids.length > 1 ? 'all of these patterns' : 'this pattern'} ({formatCount(reading.odds.combination.count)} of{' '}
          {formatCount(reading.odds.domainSize)}).
        </Text>
      ) : null}
      {reading.score.lines.map((line) => (
        <Text key={line.text} variant="caption" tone="muted">
          {line.text}
        </Text>
      ))}
      {misses.map((line) => (
        <Text key={line.key} tone="near">
          {line.text}
        </Text>
      ))}
      {reading.trade.map((note) => (
        <View key={note.id} style={styles.trade}>
          <Text variant="caption" tone={note.severity === 'warning' ? 'warn' : note.severity === 'check' ? 'near' : 'muted'}>
            {note.severity === 'info' ? '' : 'Check: '}
            {note.text}
          </Text>
          <Text variant="caption" tone="faint">
            Source: {note.source}
            {note.reference ? ` (${note.reference})` : ''}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  trade: { gap: 2 },
});
