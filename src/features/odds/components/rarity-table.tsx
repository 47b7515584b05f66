import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { oddsOf, oddsTable, PATTERN_DEFINITIONS, PATTERN_NAMES, repeatCount, runCount, type LowLimit, type PatternId } from '@shared/engine';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { fonts, space } from '@/theme/tokens';
import { formatCount, formatOneIn } from '@/lib/format';

interface Row {
  key: string;
  name: string;
  definition: string;
  count: number;
  oneIn: number;
  points: number;
  weight: number | undefined;
}


/**
 * Every pattern with its exact count over 00000001–99999999, "1 in N", rarity points log10(1/p),
 * and the hunter's own weight beside it, so rarity and worth can be compared in one glance.
 */
export function RarityTable({
  lowLimit,
  weightOf,
  domainLast = 99_999_999,
}: {
  lowLimit: LowLimit;
  weightOf(key: string): number | undefined;
  /** Last serial counted: 99,999,999, or a run end (96,000,000 for $1–$20, 99,200,000 for $50 and $100). */
  domainLast?: number;
}) {
  const theme = useTheme();
  const { isWide } = useLayout();
  const rows = useMemo<Row[]>(() => {
    const patterns = oddsTable({ lowLimit, domainLast }).map((odds) => ({
      key: odds.id,
      name: PATTERN_NAMES[odds.id as PatternId],
      definition: odds.id === 'low' ? `serial ≤ ${formatCount(lowLimit)} (your low limit)` : PATTERN_DEFINITIONS[odds.id as PatternId],
      count: odds.count,
      oneIn: odds.oneIn,
      points: odds.points,
      weight: weightOf(odds.id),
    }));
    const runs = [4, 5, 6, 7].map((length) => {
      const odds = oddsOf(runCount(length));
      return { key: `run-${length}`, name: `run of ${length}+`, definition: `${length} or more of one digit in a row`, ...odds, weight: weightOf(`runs.${length}`) };
    });
    const counts = [5, 6, 7].map((times) => {
      const odds = oddsOf(repeatCount(times));
      return { key: `count-${times}`, name: `${times}+ of a digit`, definition: `one digit ${times} or more times anywhere`, ...odds, weight: weightOf(`counts.${times}`) };
    });
    return [...patterns, ...runs, ...counts].sort((a, b) => a.count - b.count);
  }, [lowLimit, weightOf, domainLast]);
  const full = domainLast === 99_999_999;

  return (
    <View>
      <View role="table" aria-label="Rarity of every pattern" testID="rarity-table">
        <View style={[styles.row, styles.head, { borderBottomColor: theme.line }]} role="row">
          <Text role="columnheader" variant="label" tone="muted" style={styles.name}>
            Pattern
          </Text>
          <Text role="columnheader" variant="label" tone="muted" style={styles.num}>
            Serials
          </Text>
          {isWide ? (
            <Text role="columnheader" variant="label" tone="muted" style={styles.num}>
              1 in
            </Text>
          ) : null}
          <Text role="columnheader" variant="label" tone="muted" style={styles.small}>
            Rarity
          </Text>
          <Text role="columnheader" variant="label" tone="muted" style={styles.small}>
            Weight
          </Text>
        </View>
        {rows.map((row) => (
          <View key={row.key} style={[styles.row, { borderBottomColor: theme.line }]} role="row">
            <View role="cell" style={styles.name}>
              <Text bold>{row.name}</Text>
              <Text variant="caption" tone="muted">
                {row.definition}
                {isWide ? '' : ` · ${formatOneIn(row.oneIn)}`}
              </Text>
            </View>
            <Text role="cell" style={[styles.num, styles.mono]}>
              {formatCount(row.count)}
            </Text>
            {isWide ? (
              <Text role="cell" style={[styles.num, styles.mono]}>
                {formatOneIn(row.oneIn).replace('1 in ', '')}
              </Text>
            ) : null}
            <Text role="cell" style={[styles.small, styles.mono]}>
              {Number.isFinite(row.points) ? row.points.toFixed(2) : '—'}
            </Text>
            <Text role="cell" style={[styles.small, styles.mono, { color: row.weight ? theme.hit : theme.inkFaint }]}>
              {row.weight ?? '–'}
            </Text>
          </View>
        ))}
      </View>
      <Text variant="caption" tone="faint" style={styles.foot}>
        {full
          ? 'Counts are exact over the 99,999,999 serials 00000001–99999999 (worked out by counting, not sampling).'
          : `Pattern counts are exact over the ${formatCount(domainLast)} serials 00000001–${String(domainLast).padStart(8, '0')}, where circulating notes stop in a block (run ends: common practice among hunters); run and count rows stay over 00000001–99999999.`}{' '}
        Rarity is log10 of 1 in N: each point is ten times rarer. Many sellers call only true binaries (0s and 1s) “binary”; here binary is any two digits, and true binary is shown on its own row.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  head: { paddingBottom: space.xs },
  name: { flex: 1, gap: 2 },
  num: { width: 104, textAlign: 'right' },
  small: { width: 56, textAlign: 'right' },
  mono: { fontFamily: fonts.mono, fontVariant: ['tabular-nums'], fontSize: 14 },
  foot: { paddingTop: space.sm },
});
