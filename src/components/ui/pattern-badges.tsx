import { StyleSheet, View } from 'react-native';
import { PATTERN_NAMES, type PatternId } from '@shared/engine';
import { space } from '../../theme/tokens';
import { Badge } from './badge';

/** The patterns a note has, as hit badges each read out as "Pattern: radar". */
export function PatternBadges({ patterns, star, testID }: { patterns: readonly PatternId[]; star?: boolean; testID?: string }) {
  return (
    <View style={styles.row} testID={testID}>
      {patterns.map((id) => (
        <Badge key={id} label={PATTERN_NAMES[id]} tone="hit" accessibilityLabel={`Pattern: ${PATTERN_NAMES[id]}`} />
      ))}
      {star ? <Badge label="★ star" tone="near" accessibilityLabel="Star note" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  // Shrinks inside a table cell or a row, so a third badge wraps instead of spilling over its neighbour.
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, flexShrink: 1, minWidth: 0 },
});
