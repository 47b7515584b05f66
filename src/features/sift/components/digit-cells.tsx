import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius } from '@/theme/tokens';
import { SERIAL_LENGTH } from '../serial-entry';

interface DigitCellsProps {
  digits: string;
  prefix: string;
  star: boolean;
  /** 1-based positions a near miss would change, marked under the cells. */
  highlight?: number[];
  /** 1-based positions the camera was unsure of: check them, and fix them on the keypad if wrong. */
  unsure?: number[];
  hit?: boolean;
}

/** Eight fixed cells, so the eye finds the fifth digit in the same place on every note. */
export function DigitCells({ digits, prefix, star, highlight = [], unsure = [], hit }: DigitCellsProps) {
  const theme = useTheme();
  const cells = Array.from({ length: SERIAL_LENGTH }, (_, index) => digits[index] ?? '');
  return (
    <View
      style={styles.row}
      accessibilityRole="text"
      accessibilityLabel={`Serial ${prefix ? `${prefix} ` : ''}${digits.split('').join(' ') || 'empty'}${star ? ', star note' : ''}${unsure.length ? `; check digit ${unsure.join(', ')}` : ''}`}
      accessibilityLiveRegion="polite"
      testID="digit-cells"
    >
      {prefix ? (
        <Text style={[styles.affix, { color: theme.inkMuted }]} accessibilityElementsHidden>
          {prefix}
        </Text>
      ) : null}
      {cells.map((digit, index) => {
        const current = index === digits.length;
        const marked = highlight.includes(index + 1);
        const doubtful = unsure.includes(index + 1);
        return (
          <View
            key={index}
            style={[
              styles.cell,
              {
                borderColor: doubtful ? theme.warn : current ? theme.brand : marked ? theme.near : theme.line,
                backgroundColor: hit && digit ? theme.hitSoft : theme.surfaceRaised,
              },
              current && styles.current,
              doubtful && styles.doubtful,
              index === 3 && styles.gap,
            ]}
          >
            <Text style={[styles.digit, { color: hit ? theme.hit : theme.ink }]}>{digit}</Text>
            {marked ? <View style={[styles.mark, { backgroundColor: theme.near }]} /> : null}
          </View>
        );
      })}
      <Text style={[styles.affix, { color: star ? theme.hit : theme.line }]} accessibilityElementsHidden>
        ★
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'center', gap: 4 },
  cell: {
    flex: 1,
    maxWidth: 52,
    aspectRatio: 0.78,
    borderWidth: 1.5,
    borderRadius: radius.sm,
    alignItems: 'center',
    justifyContent: 'center',
  },
  current: { borderWidth: 2.5 },
  doubtful: { borderWidth: 3, borderStyle: 'dashed' },
  gap: { marginRight: 6 },
  digit: { fontFamily: fonts.monoMedium, fontSize: 30, fontVariant: ['tabular-nums'] },
  mark: { position: 'absolute', bottom: 4, width: 12, height: 3, borderRadius: 2 },
  affix: { fontFamily: fonts.monoMedium, fontSize: 20, minWidth: 18, textAlign: 'center' },
});
