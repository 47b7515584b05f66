import { StyleSheet, View } from 'react-native';
import { PATTERN_NAMES, type ReadResult, type WeightTable } from '@shared/engine';
import { Badge } from '@/components/ui/badge';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { nearMissLines, neighbourLines } from '../reading-view';
import { formatOneIn } from '@/lib/format';
import { stillPossible } from '../still-possible';

interface ReadingPanelProps {
  digits: string;
  reading: ReadResult | null;
  weights: WeightTable;
  /** Phones show a shorter reading so the keypad keeps its half of the screen. */
  compact?: boolean;
}

export function ReadingPanel({ digits, reading, weights, compact }: ReadingPanelProps) {
  const theme = useTheme();

  if (!reading) {
    const possible = stillPossible(digits, weights.lowLimit);
    return (
      <View style={styles.panel} testID="reading-panel" accessibilityLiveRegion="polite">
        <Text variant="label" tone="muted">
          {digits.length === 0 ? 'READY FOR THE NEXT NOTE' : `${8 - digits.length} MORE DIGIT${digits.length === 7 ? '' : 'S'}`}
        </Text>
        {digits.length > 0 ? (
          <>
            <Text tone="muted">{possible.length ? 'Still possible:' : 'No pattern is possible any more; an ordinary note.'}</Text>
            <View style={styles.badges}>
              {possible.map((id) => (
                <Badge key={id} label={PATTERN_NAMES[id]} tone="neutral" />
              ))}
            </View>
          </>
        ) : (
          <Text tone="muted">Type the eight digits of the serial. The reading lands with the last one.</Text>
        )}
      </View>
    );
  }

  if (!reading.ok) {
    return (
      <View style={styles.panel} testID="reading-panel" accessibilityRole="alert">
        <Text variant="label" tone="danger">
          NOT A SERIAL
        </Text>
        <Text>{reading.error.message}</Text>
      </View>
    );
  }

  const misses = nearMissLines(reading);
  const neighbours = neighbourLines(reading, weights, compact ? 2 : 4);
  const hit = reading.patterns.length > 0;
  const features = [
    reading.run && reading.run.length >= 4 ? `run of ${reading.run.length} × ${reading.run.digit}` : null,
    reading.count && reading.count.times >= 5 ? `${reading.count.times} × ${reading.count.digit}` : null,
  ].filter((text): text is string => !!text);
  const matchedWatch = reading.watch.filter((watch) => watch.matched);
  // A phone keeps its reading short, but a warning or a check (a run end passed, a duplicated star) always shows.
  const checkRun = reading.trade.some((note) => note.id === 'star-run' && note.severity === 'check');
  const tradeShown = compact ? reading.trade.filter((note) => note.severity !== 'info') : reading.trade;

  return (
    <View style={styles.panel} testID="reading-panel" accessibilityLiveRegion="polite">
      <View style={styles.scoreRow}>
        <View
          style={[styles.score, { backgroundColor: reading.score.keep ? theme.hit : theme.surfaceSunken, borderColor: reading.score.keep ? theme.hit : theme.line }]}
          accessibilityLabel={`${reading.score.points} points, ${reading.score.keep ? 'keep it' : checkRun ? 'look up its star run before it goes back' : 'back in the strap'}`}
          testID="reading-score"
        >
          <Text style={[styles.scoreNumber, { color: reading.score.keep ? theme.onHit : theme.ink }]}>{formatPoints(reading.score.points)}</Text>
          <Text variant="caption" style={{ color: reading.score.keep ? theme.onHit : theme.inkMuted }}>
            {reading.score.keep ? 'KEEP' : 'pts'}
          </Text>
        </View>
        <View style={styles.verdict}>
          <Text variant="heading" tone={hit ? 'hit' : 'ink'} testID="reading-verdict">
            {hit ? reading.patterns.map((id) => PATTERN_NAMES[id]).join(' · ') : 'An ordinary note'}
          </Text>
          <Text variant="caption" tone="muted">
            {reading.odds.combination
              ? `${formatOneIn(reading.odds.combination.oneIn)} notes has ${reading.patterns.length > 1 ? 'all of these' : 'this'}`
              : reading.score.suggestion}
          </Text>
        </View>
      </View>

      {hit || features.length || reading.star || matchedWatch.length ? (
        <View style={styles.badges} testID="reading-badges">
          {reading.patterns.map((id) => (
            <Badge key={id} label={PATTERN_NAMES[id]} tone="hit" accessibilityLabel={`Pattern: ${PATTERN_NAMES[id]}`} />
          ))}
          {reading.star ? <Badge label="★ star" tone="hit" accessibilityLabel="Star note" /> : null}
          {matchedWatch.map((watch) => (
            <Badge key={watch.text} label={`watch ${watch.pattern.label ?? watch.text}`} tone="hit" />
          ))}
          {features.map((text) => (
            <Badge key={text} label={text} tone="neutral" />
          ))}
        </View>
      ) : null}

      {misses.length ? (
        <View style={styles.section} testID="reading-near-misses">
          {misses.slice(0, compact ? 2 : 6).map((line) => (
            <View key={line.key} style={styles.lineRow}>
              <View style={[styles.dot, { backgroundColor: theme.near }]} />
              <Text tone="near" style={styles.lineText}>
                {line.text}
              </Text>
            </View>
          ))}
        </View>
      ) : null}

      {neighbours.length ? (
        <View style={styles.section} testID="reading-neighbours">
          {neighbours.map((line) => (
            <Text key={line.key} variant="caption" tone="muted">
              {line.text} <Text variant="caption" style={{ fontFamily: fonts.mono }} tone="faint">({line.serial})</Text>
            </Text>
          ))}
        </View>
      ) : null}

      {tradeShown.length ? (
        <View style={[styles.section, styles.trade, { borderColor: theme.line }]} testID="reading-trade">
          {tradeShown.map((note, i) => (
            <Text key={`${note.id}-${i}`} variant="caption" tone={note.severity === 'warning' ? 'warn' : 'muted'}>
              {note.severity === 'info' ? '' : note.severity === 'warning' ? 'Warning: ' : 'Check: '}
              {note.text}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

function formatPoints(points: number): string {
  return Number.isInteger(points) ? String(points) : points.toFixed(1);
}

const styles = StyleSheet.create({
  panel: { gap: space.md },
  scoreRow: { flexDirection: 'row', gap: space.md, alignItems: 'center' },
  score: { minWidth: 64, height: 64, borderRadius: radius.md, borderWidth: 1, alignItems: 'center', justifyContent: 'center' },
  scoreNumber: { fontFamily: fonts.monoBold, fontSize: 26, lineHeight: 30 },
  verdict: { flex: 1, gap: 2 },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  section: { gap: space.xs },
  lineRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  dot: { width: 8, height: 8, borderRadius: 4 },
  lineText: { flex: 1 },
  trade: { borderTopWidth: 1, paddingTop: space.sm },
});
