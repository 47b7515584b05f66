import { StyleSheet, View } from 'react-native';
import { BarChart } from '@/components/ui/bar-chart';
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
    `Hits per 1,000 notes for ${rows.length} ${what}. Highest: ${high.name}, ${formatRate(high.perThousand)}. ` +
    `Lowest: ${low.name}, ${formatRate(low.perThousand)}. Average over the period: ${formatRate(average)}.`
  );
}

interface RateSectionProps {
  what: string;
  firstHeader: string;
  rows: readonly RateRow[];
  average: number;
  wide: boolean;
  testID?: string;
}

/** Hits per 1,000 notes as bars, with the average as a dashed line, and the same numbers in a table. */
export function RateSection({ what, firstHeader, rows, average, wide, testID }: RateSectionProps) {
  if (rows.length === 0) return <Text tone="muted">No notes in this period.</Text>;
  const columns: Column<RateRow>[] = [
    { key: 'name', header: firstHeader, flex: 2, cell: (row) => row.name },
    { key: 'notes', header: 'Notes', align: 'right', cell: (row) => row.notes },
    { key: 'hits', header: 'Hits', align: 'right', cell: (row) => row.hits },
    { key: 'rate', header: 'Per 1,000', align: 'right', cell: (row) => <Text variant="mono">{formatRate(row.perThousand)}</Text> },
  ];
  return (
    <View style={wide ? styles.sideBySide : styles.stacked} testID={testID}>
      <View style={wide ? styles.chart : null}>
        <BarChart
          data={rows.map((row) => ({ key: row.key, label: row.label, value: row.perThousand }))}
          summary={rateSummary(what, rows, average)}
          formatValue={formatRate}
          reference={{ value: average, label: `average ${formatRate(average)}` }}
          testID={testID ? `${testID}-chart` : undefined}
        />
      </View>
      <View style={wide ? styles.table : null}>
        <DataTable
          label={`Hits per 1,000 notes by ${firstHeader.toLowerCase()}, ${formatCount(rows.length)} rows`}
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
});
