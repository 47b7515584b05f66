import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { space } from '../../theme/tokens';
import { Text } from './text';

export interface Column<T> {
  key: string;
  header: string;
  /** A string or number is drawn as text (numbers in the tabular mono face); anything else as given. */
  cell(row: T): ReactNode;
  align?: 'left' | 'right' | 'center';
  /** Share of the spare width (default 1); a fixed `width` wins over it. */
  flex?: number;
  width?: number;
}

interface DataTableProps<T> {
  /** What the table lists, read out by screen readers before the rows. */
  label: string;
  columns: readonly Column<T>[];
  rows: readonly T[];
  rowKey(row: T): string;
  empty?: string;
  /** Below this width the table scrolls sideways instead of squeezing its columns. */
  minWidth?: number;
  testID?: string;
  /** Marks a row (e.g. a strap that is short) with the quiet sunken background. */
  highlight?(row: T): boolean;
  /** Slots a full-width element under a row, such as an inline editor. */
  below?(row: T): ReactNode;
}

/**
 * Rows and columns for wide screens, built from views with ARIA table roles so a screen reader
 * announces "row 3, Searched, 100" instead of a run of loose numbers.
 */
export function DataTable<T>({ label, columns, rows, rowKey, empty, minWidth, testID, highlight, below }: DataTableProps<T>) {
  const theme = useTheme();
  const sizing = (column: Column<T>) => (column.width ? { width: column.width } : { flex: column.flex ?? 1, minWidth: 0 });
  const justify = (column: Column<T>) =>
    column.align === 'right' ? styles.right : column.align === 'center' ? styles.center : styles.left;

  const table = (
    <View role="table" aria-label={label} testID={testID} style={[styles.table, minWidth ? { minWidth } : null, { borderColor: theme.line }]}>
      <View role="row" style={[styles.row, styles.headRow, { borderBottomColor: theme.line, backgroundColor: theme.surfaceSunken }]}>
        {columns.map((column) => (
          // An action column has no heading; an empty header cell would announce nothing, so it is a plain cell.
          <View key={column.key} role={column.header ? 'columnheader' : 'cell'} style={[styles.cell, sizing(column), justify(column)]}>
            <Text variant="label" tone="muted" style={column.align === 'right' ? styles.textRight : null}>
              {column.header}
            </Text>
          </View>
        ))}
      </View>
      {rows.length === 0 && empty ? (
        <View role="row" style={styles.emptyRow}>
          <View role="cell" style={styles.cell}>
            <Text tone="muted">{empty}</Text>
          </View>
        </View>
      ) : null}
      {rows.map((row, index) => {
        const extra = below?.(row);
        return (
          <View key={rowKey(row)} style={{ borderTopColor: theme.line, borderTopWidth: index === 0 ? 0 : StyleSheet.hairlineWidth }}>
            <View role="row" style={[styles.row, highlight?.(row) ? { backgroundColor: theme.surfaceSunken } : null]}>
              {columns.map((column) => {
                const content = column.cell(row);
                return (
                  <View key={column.key} role="cell" style={[styles.cell, sizing(column), justify(column)]}>
                    {typeof content === 'number' ? (
                      <Text variant="mono" style={styles.textRight}>
                        {content.toLocaleString('en-US')}
                      </Text>
                    ) : typeof content === 'string' ? (
                      <Text style={column.align === 'right' ? styles.textRight : null}>{content}</Text>
                    ) : (
                      content
                    )}
                  </View>
                );
              })}
            </View>
            {extra ? <View style={styles.below}>{extra}</View> : null}
          </View>
        );
      })}
    </View>
  );
  // Only a table with a minimum width needs the sideways scroll; the rest fit their column.
  return minWidth ? (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      {table}
    </ScrollView>
  ) : (
    table
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  table: { borderWidth: 1, borderRadius: 10, overflow: 'hidden', width: '100%' },
  row: { flexDirection: 'row', alignItems: 'center', minHeight: 44 },
  headRow: { borderBottomWidth: 1, minHeight: 36 },
  emptyRow: { flexDirection: 'row', padding: space.sm },
  cell: { paddingHorizontal: space.sm, paddingVertical: space.xs, flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, alignItems: 'center' },
  left: { justifyContent: 'flex-start' },
  right: { justifyContent: 'flex-end' },
  center: { justifyContent: 'center' },
  textRight: { textAlign: 'right' },
  below: { paddingHorizontal: space.md, paddingBottom: space.md },
});
