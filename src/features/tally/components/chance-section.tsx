import { StyleSheet, View } from 'react-native';
import type { TallyPatternRow } from '@shared/contracts';
import { DataTable, type Column } from '@/components/ui/data-table';
import { Notice } from '@/components/ui/notice';
import { PairedBars } from '@/components/ui/paired-bars';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';
import { formatChance, formatCount, formatExpected, formatRate, luck, verdict, VERDICT_TEXT } from '../format';

export interface ChanceFigures {
  notes: number;
  patterns: readonly TallyPatternRow[];
  /** `sequence`: new notes in sequence, against every run of that length; `poisson`: circulated; `mixed`: both. */
  basis?: 'poisson' | 'sequence' | 'mixed';
  caveat: string;
}

const BASIS_TEXT = {
  poisson:
    'Chance by luck: the Poisson probability, with the expected count as its mean, of finding at least this many (or, below the expected count, at most this many) by luck alone.',
  sequence:
    'Chance by luck: the share of all runs of this many notes in sequence, from every possible starting serial, holding at least this many (or, below the expected count, at most this many).',
  mixed:
    'Chance by luck: hunts in sequence as runs from every possible starting serial, circulated notes as Poisson draws, combined exactly.',
} as const;

const CAVEAT_TITLE = {
  poisson: 'Circulated notes: independent draws',
  sequence: 'New notes in sequence: compared run for run',
  mixed: 'Notes in sequence and circulated notes together',
} as const;

/** The chance by luck of a count this far out, and in words whether it stands out. */
function LuckCell({ row }: { row: TallyPatternRow }) {
  const v = verdict(row);
  const chance = luck(row);
  return (
    <View style={styles.stackRight}>
      <Text variant="mono" style={styles.luck}>
        {chance ? formatChance(chance.p) : '—'}
      </Text>
      <Text variant="caption" tone={v === 'more' ? 'hit' : v === 'fewer' ? 'warn' : 'faint'} style={styles.rightText}>
        {chance ? `${chance.direction} ${formatCount(row.hits)}: ` : ''}
        {VERDICT_TEXT[v]}
      </Text>
    </View>
  );
}

/** The sentence a screen reader hears for the chart: which patterns stand out, or that none do. */
export function chanceSummary(figures: ChanceFigures): string {
  const lucky = figures.patterns.filter((row) => verdict(row) === 'more').map((row) => row.name);
  const thin = figures.patterns.filter((row) => verdict(row) === 'fewer').map((row) => row.name);
  const parts = [`Finds against the finds expected by chance in ${formatCount(figures.notes)} notes.`];
  if (lucky.length) parts.push(`More than chance: ${lucky.join(', ')}.`);
  if (thin.length) parts.push(`Fewer than chance: ${thin.join(', ')}.`);
  if (!lucky.length && !thin.length) parts.push('Every pattern is about what chance predicts.');
  return parts.join(' ');
}

const wideColumns: Column<TallyPatternRow>[] = [
  { key: 'name', header: 'Pattern', flex: 1.3, cell: (row) => row.name },
  { key: 'hits', header: 'Found', align: 'right', cell: (row) => row.hits },
  { key: 'rate', header: 'Per 1,000', align: 'right', cell: (row) => <Text variant="mono">{formatRate(row.perThousand)}</Text> },
  { key: 'expected', header: 'Expected', align: 'right', cell: (row) => <Text variant="mono">{formatExpected(row.expected)}</Text> },
  { key: 'chance', header: 'Chance by luck', flex: 2, align: 'right', cell: (row) => <LuckCell row={row} /> },
];

// A phone has room for four narrow columns: the rate rides under the count, figures a size smaller.
const compactColumns: Column<TallyPatternRow>[] = [
  { key: 'name', header: 'Pattern', flex: 1.1, cell: (row) => <Text variant="caption">{row.name}</Text> },
  {
    key: 'hits',
    header: 'Found',
    align: 'right',
    flex: 0.8,
    cell: (row) => (
      <View style={styles.stackRight}>
        <Text variant="mono" style={styles.small}>
          {formatCount(row.hits)}
        </Text>
        <Text variant="caption" tone="faint">
          {formatRate(row.perThousand)}/1k
        </Text>
      </View>
    ),
  },
  {
    key: 'expected',
    header: 'Expected',
    align: 'right',
    flex: 1.1,
    cell: (row) => (
      <Text variant="mono" style={[styles.small, styles.rightText]}>
        {formatExpected(row.expected)}
      </Text>
    ),
  },
  { key: 'chance', header: 'By luck', flex: 1.6, align: 'right', cell: (row) => <LuckCell row={row} /> },
];

/**
 * Hits per pattern set against chance: the chart and the same numbers in a table, with the engine's
 * caveat that sequential straps are not independent draws.
 */
export function ChanceSection({ figures, wide, testID }: { figures: ChanceFigures; wide: boolean; testID?: string }) {
  if (figures.notes === 0) {
    return <Text tone="muted">No notes logged yet, so there is nothing to set against chance.</Text>;
  }
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={wide ? styles.sideBySide : styles.stacked}>
        <View style={wide ? styles.chartWide : null}>
          <PairedBars
            data={figures.patterns.map((row) => ({ key: row.id, label: row.name, actual: row.hits, expected: row.expected }))}
            summary={chanceSummary(figures)}
            formatValue={formatExpected}
            testID={testID ? `${testID}-chart` : undefined}
          />
        </View>
        <View style={wide ? styles.tableWide : null}>
          <DataTable
            label={`Finds per pattern against chance, ${formatCount(figures.notes)} notes`}
            columns={wide ? wideColumns : compactColumns}
            rows={figures.patterns}
            rowKey={(row) => row.id}
            testID={testID ? `${testID}-table` : undefined}
          />
        </View>
      </View>
      <Text variant="caption" tone="faint">
        {BASIS_TEXT[figures.basis ?? 'poisson']}
      </Text>
      <Notice tone="info" title={CAVEAT_TITLE[figures.basis ?? 'poisson']}>
        {figures.caveat}
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  sideBySide: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  stacked: { gap: space.lg },
  chartWide: { flex: 1, minWidth: 0 },
  tableWide: { flex: 1.3, minWidth: 0 },
  stackRight: { alignItems: 'flex-end', flexShrink: 1, minWidth: 0 },
  luck: { fontSize: 14, textAlign: 'right' },
  small: { fontSize: 13 },
  rightText: { textAlign: 'right' },
});
