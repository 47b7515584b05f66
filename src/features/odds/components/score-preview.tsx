import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { PATTERN_NAMES, read, type WatchPattern, type WeightTable } from '@shared/engine';
import { Field } from '@/components/ui/field';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, space } from '@/theme/tokens';

// Invented examples, one of each kind a hunter meets, so the effect of a weight shows at once.
export const SAMPLE_SERIALS = ['12344321', '45674567', '88888888', '00000417', '21121221', '55155516', '60019009', '31740598'];

/** Scores the samples (and the hunter's own serial) with the table being edited, live. */
export function ScorePreview({ weights, watch }: { weights: WeightTable | null; watch: WatchPattern[] }) {
  const theme = useTheme();
  const [own, setOwn] = useState('');
  const serials = useMemo(() => (own.trim() ? [own.trim(), ...SAMPLE_SERIALS] : SAMPLE_SERIALS), [own]);
  return (
    <View style={styles.wrap} testID="score-preview">
      <Field label="Try a serial" value={own} onChangeText={setOwn} placeholder="8 digits" inputMode="numeric" maxLength={20} testID="preview-serial" />
      {!weights ? (
        <Text tone="danger">Fix the highlighted weights to see the preview.</Text>
      ) : (
        serials.map((serial, index) => {
          const reading = read(serial, { weights, watch });
          return (
            <View key={`${serial}-${index}`} style={[styles.row, { borderBottomColor: theme.line }]}>
              <Text style={styles.serial}>{serial}</Text>
              {reading.ok ? (
                <>
                  <Text variant="caption" tone={reading.patterns.length ? 'hit' : 'faint'} style={styles.patterns} numberOfLines={2}>
                    {reading.score.lines.map((line) => line.text).join(' · ') || (reading.patterns.map((id) => PATTERN_NAMES[id]).join(' · ') || 'no pattern')}
                  </Text>
                  <Text style={[styles.points, { color: reading.score.keep ? theme.hit : theme.ink }]} accessibilityLabel={`${reading.score.points} points${reading.score.keep ? ', keep' : ''}`}>
                    {reading.score.points}
                    {reading.score.keep ? ' ✓' : ''}
                  </Text>
                </>
              ) : (
                <Text variant="caption" tone="danger" style={styles.patterns}>
                  {reading.error.message}
                </Text>
              )}
            </View>
          );
        })
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  serial: { fontFamily: fonts.mono, fontSize: 16, width: 96 },
  patterns: { flex: 1 },
  points: { fontFamily: fonts.monoBold, fontSize: 16, minWidth: 48, textAlign: 'right' },
});
