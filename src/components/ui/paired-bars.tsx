import { StyleSheet, View } from 'react-native';
import Svg, { Rect } from 'react-native-svg';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

export interface PairedDatum {
  key: string;
  label: string;
  actual: number;
  expected: number;
}

interface PairedBarsProps {
  data: readonly PairedDatum[];
  summary: string;
  formatValue(value: number): string;
  actualLabel?: string;
  expectedLabel?: string;
  testID?: string;
}

const BAR_WIDTH = 100;

/**
 * Actual against expected, one row per pattern. Expected counts range from millionths (a solid) to
 * dozens (a trinary), so each row is drawn to its own larger value: the bars compare the two figures
 * of a row, never rows with each other. The figures themselves are printed at the row's end.
 */
export function PairedBars({ data, summary, formatValue, actualLabel = 'found', expectedLabel = 'expected', testID }: PairedBarsProps) {
  const theme = useTheme();
  return (
    <View role="img" aria-label={summary} testID={testID} style={styles.wrap}>
      <View style={styles.legend} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
        <View style={styles.key}>
          <View style={[styles.swatch, { backgroundColor: theme.hit }]} />
          <Text variant="caption" tone="muted">
            {actualLabel}
          </Text>
        </View>
        <View style={styles.key}>
          <View style={[styles.swatch, { backgroundColor: theme.nearSoft, borderColor: theme.near, borderWidth: 1 }]} />
          <Text variant="caption" tone="muted">
            {expectedLabel} by chance
          </Text>
        </View>
        <Text variant="caption" tone="faint">
          each row drawn to its own scale
        </Text>
      </View>
      {data.map((datum) => {
        const top = Math.max(datum.actual, datum.expected);
        const share = (value: number) => (top > 0 ? (value / top) * BAR_WIDTH : 0);
        return (
          <View key={datum.key} style={styles.row} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
            <Text variant="caption" numberOfLines={1} style={styles.label}>
              {datum.label}
            </Text>
            <View style={styles.bars}>
              <Svg width="100%" height={22} viewBox={`0 0 ${BAR_WIDTH} 22`} preserveAspectRatio="none">
                <Rect x={0} y={2} width={Math.max(share(datum.actual), datum.actual > 0 ? 0.8 : 0)} height={8} fill={theme.hit} />
                <Rect
                  x={0}
                  y={12}
                  width={Math.max(share(datum.expected), datum.expected > 0 ? 0.8 : 0)}
                  height={8}
                  fill={theme.nearSoft}
                  stroke={theme.near}
                  strokeWidth={0.6}
                />
              </Svg>
            </View>
            <Text variant="caption" style={styles.figures} numberOfLines={1}>
              {formatValue(datum.actual)} / {formatValue(datum.expected)}
            </Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  legend: { flexDirection: 'row', alignItems: 'center', columnGap: space.md, rowGap: space.xxs, flexWrap: 'wrap', marginBottom: space.xs },
  key: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 12, height: 12, borderRadius: radius.sm / 2 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { width: 96 },
  bars: { flex: 1, minWidth: 60 },
  figures: { width: 120, textAlign: 'right', fontVariant: ['tabular-nums'] },
});
