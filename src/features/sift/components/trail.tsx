import { StyleSheet, View } from 'react-native';
import { PATTERN_NAMES, type PatternId } from '@shared/engine';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, space } from '@/theme/tokens';
import type { TrailNote } from '../strap-count';

interface TrailProps {
  notes: TrailNote[];
  onAddToKeepers(note: TrailNote): void;
  limit?: number;
}

/** The last notes logged, newest first, so a hunter can glance back without leaving the keypad. */
export function Trail({ notes, onAddToKeepers, limit = 10 }: TrailProps) {
  const theme = useTheme();
  if (!notes.length) {
    return (
      <Text variant="caption" tone="faint">
        Logged notes appear here, newest first.
      </Text>
    );
  }
  return (
    <View style={styles.list} accessibilityLabel="Last notes logged" testID="trail">
      {notes.slice(0, limit).map((note) => (
        <View key={note.id} style={[styles.row, { borderBottomColor: theme.line }]}>
          <Text style={[styles.serial, { color: note.patterns.length ? theme.hit : theme.ink }]}>
            {note.prefix ? `${note.prefix} ` : ''}
            {note.digits}
            {note.star ? '★' : ''}
          </Text>
          <Text variant="caption" tone={note.patterns.length ? 'hit' : 'faint'} style={styles.patterns} numberOfLines={1}>
            {note.patterns.length ? note.patterns.map((id) => PATTERN_NAMES[id as PatternId] ?? id).join(' · ') : `s${note.strap}`}
          </Text>
          {note.pulled ? (
            note.addedToKeepers ? (
              <Text variant="caption" tone="ok">
                in keepers
              </Text>
            ) : (
              <Button compact kind="secondary" label="Add to keepers" onPress={() => onAddToKeepers(note)} />
            )
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: 6, borderBottomWidth: StyleSheet.hairlineWidth, minHeight: 40 },
  serial: { fontFamily: fonts.mono, fontSize: 15, fontVariant: ['tabular-nums'] },
  patterns: { flex: 1 },
});
