import { StyleSheet, View } from 'react-native';
import { BarChart, type BarDatum } from '@/components/ui/bar-chart';
import { DataTable, type Column } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';
import { formatCount, formatRate } from '../format';

export interface RateRow {
  key: string;
  /** Under the bar: short. */
  label: string;
  /** In the table: the whole name. */
  name: string;
  /** A second, quieter line under the name (a hunt's date). */
  detail?: string;
  notes: number;
  hits: number;
  perThousand: number;
}

/** "Highest: Mar 2 at 9.5 per 1,000; lowest: …", the chart's words for a screen reader. */
export function rateSummary(what: string, rows: readonly RateRow[], average: number): string {
  if (rows.length === 0) return `No ${what} yet.`;
  const sorted = [...rows].sort((a, b) => b.perThousand - a.perThousand);
  const high = sorted[0]!;
  const low = sorted[sorted.length - 1]!;
  return (
    `Finds per 1,000 notes for ${rows.length} ${what}. Highest: ${high.name}, ${formatRate(high.perThousand)}. ` +
    `Lowest: ${low.name}, ${formatRate(low.perThousand)}. Average over the period: ${formatRate(average)}.`
  );
}

interface RateSectionProps {
  what: string;
  firstHeader: string;
  rows: readonly RateRow[];
  average: number;
  wide: boolean;
  /** Bars to draw when they differ from the rows, e.g. with empty weeks kept as gaps. */
  chartData?: readonly BarDatum[];
  testID?: string;
}

/** Finds per 1,000 notes as bars, with the average as a dashed line, and the same numbers in a table. */
export function RateSection({ what, firstHeader, rows, average, wide, chartData, testID }: RateSectionProps) {
  if (rows.length === 0) return <Text tone="muted">No notes in this period.</Text>;
  const columns: Column<RateRow>[] = [
    {
      key: 'name',
      header: firstHeader,
      flex: 2.2,
      cell: (row) => (
        <View style={styles.name}>
          <Text>{row.name}</Text>
          {row.detail ? (
            <Text variant="caption" tone="muted">
              {row.detail}
            </Text>
          ) : null}
        </View>
      ),
    },
    { key: 'notes', header: 'Notes', align: 'right', cell: (row) => <Text variant="mono" style={wide ? null : styles.small}>{formatCount(row.notes)}</Text> },
    { key: 'hits', header: 'Finds', align: 'right', flex: 0.7, cell: (row) => <Text variant="mono" style={wide ? null : styles.small}>{formatCount(row.hits)}</Text> },
    {
      key: 'rate',
      header: wide ? 'Per 1,000' : 'Per 1k',
      align: 'right',
      flex: 1.1,
      cell: (row) => <Text variant="mono" style={wide ? null : styles.small}>{formatRate(row.perThousand)}</Text>,
    },
  ];
  return (
    <View style={wide ? styles.sideBySide : styles.stacked} testID={testID}>
      <View style={wide ? styles.chart : null}>
        <BarChart
          data={chartData ?? rows.map((row) => ({ key: row.key, label: row.label, value: row.perThousand }))}
          summary={rateSummary(what, rows, average)}
          formatValue={formatRate}
          reference={{ value: average, label: `average ${formatRate(average)}` }}
          testID={testID ? `${testID}-chart` : undefined}
        />
      </View>
      <View style={wide ? styles.table : null}>
        <DataTable
          label={`Finds per 1,000 notes by ${firstHeader.toLowerCase()}, ${formatCount(rows.length)} rows`}
          columns={columns}
          rows={rows}
          rowKey={(row) => row.key}
          testID={testID ? `${testID}-table` : undefined}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  sideBySide: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  stacked: { gap: space.md },
  chart: { flex: 1.2, minWidth: 0 },
  table: { flex: 1, minWidth: 0 },
  name: { flexShrink: 1, minWidth: 0 },
  small: { fontSize: 14 },
});
