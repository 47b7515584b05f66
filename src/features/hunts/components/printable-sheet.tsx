import { StyleSheet, Text, View } from 'react-native';
import type { StrapRow, StrapSheet } from '@shared/contracts';
import { balanceOf } from '@shared/straps';
import { NOTES_PER_STRAP } from '@shared/trade';
import { fonts } from '@/theme/tokens';
import { printedStraps } from '../sheet-text';
import { caption, formatCount, formatDate } from '@/lib/format';

// Paper is white whatever the screen's theme, and ink is black: these colours are the printer's, not the theme's.
const INK = '#000000';
const RULE = '#888888';
/** Above this many straps the table is split into two columns so a brick still fits one page. */
const ONE_COLUMN_MAX = 25;

function StrapTable({ rows }: { rows: StrapRow[] }) {
  return (
    <View style={styles.table} role="table" aria-label="Straps returned">
      <View style={[styles.row, styles.head]} role="row">
        {['Strap', 'Received', 'Pulled', 'Swapped in', 'Goes back', 'Complete'].map((header, index) => (
          <Text key={header} role="columnheader" style={[styles.cell, styles.headText, index === 0 ? styles.first : null]}>
            {header}
          </Text>
        ))}
      </View>
      {rows.map((row) => (
        <View key={row.number} style={styles.row} role="row">
          <Text role="cell" style={[styles.cell, styles.first, styles.bold]}>
            {row.number}
          </Text>
          <Text role="cell" style={styles.cell}>
            {row.received}
          </Text>
          <Text role="cell" style={styles.cell}>
            {row.pulled}
          </Text>
          <Text role="cell" style={styles.cell}>
            {row.swappedIn}
          </Text>
          <Text role="cell" style={[styles.cell, styles.bold]}>
            {row.notesBack}
          </Text>
          <Text role="cell" style={[styles.cell, styles.mark]}>
            {row.complete ? '✓' : balanceOf(row.notesBack).label}
          </Text>
        </View>
      ))}
    </View>
  );
}

/**
 * One hunt on one page for the teller: the straps going back, each with its count, the totals and a
 * line for the teller's initials. Only counts of notes are printed, never dollar amounts or serials
 * (TRADE.md: keep cash totals private).
 */
export function PrintableSheet({ sheet, startedAt, hunter }: { sheet: StrapSheet; startedAt: string; hunter: string }) {
  const straps = printedStraps(sheet);
  const split = straps.length > ONE_COLUMN_MAX;
  const half = Math.ceil(straps.length / 2);
  const notesBack = straps.reduce((sum, row) => sum + row.notesBack, 0);
  const complete = straps.filter((row) => row.complete).length;
  return (
    <View style={styles.page} testID="printable-sheet">
      <Text style={styles.kicker}>STRAP SHEET</Text>
      <Text style={styles.title}>{sheet.title}</Text>
      <Text style={styles.meta}>
        {caption(sheet.source, `$${sheet.denomination} notes`, formatDate(startedAt), hunter)}
      </Text>
      <View style={split ? styles.columns : null}>
        <View style={split ? styles.column : null}>
          <StrapTable rows={split ? straps.slice(0, half) : straps} />
        </View>
        {split ? (
          <View style={styles.column}>
            <StrapTable rows={straps.slice(half)} />
          </View>
        ) : null}
      </View>
      <Text style={styles.totals} testID="printable-totals">
        {straps.length} straps · {formatCount(notesBack)} notes going back · {complete} of {straps.length} complete
      </Text>
      <View style={styles.signatures}>
        <View style={styles.signature}>
          <View style={styles.line} />
          <Text style={styles.small}>Teller&apos;s initials</Text>
        </View>
        <View style={styles.signature}>
          <View style={styles.line} />
          <Text style={styles.small}>Date</Text>
        </View>
      </View>
      <Text style={styles.small}>
        Each strap holds {NOTES_PER_STRAP} notes as received; pulled notes were replaced from the hunter&apos;s own cash.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { backgroundColor: '#FFFFFF', padding: 8, gap: 8 },
  kicker: { color: INK, fontSize: 10, letterSpacing: 2, fontWeight: '700' },
  title: { color: INK, fontSize: 20, fontWeight: '700' },
  meta: { color: INK, fontSize: 12 },
  columns: { flexDirection: 'row', gap: 16, alignItems: 'flex-start' },
  column: { flex: 1 },
  table: { borderTopWidth: 1, borderColor: INK, marginTop: 4 },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderColor: RULE, minHeight: 20, alignItems: 'center' },
  head: { borderBottomColor: INK },
  cell: { flex: 1, color: INK, fontSize: 11, fontFamily: fonts.mono, textAlign: 'right', paddingHorizontal: 4, paddingVertical: 2 },
  first: { textAlign: 'left' },
  headText: { fontFamily: fonts.body, fontWeight: '700', fontSize: 10 },
  mark: { fontFamily: fonts.body },
  bold: { fontWeight: '700' },
  totals: { color: INK, fontSize: 12, fontWeight: '700', marginTop: 4 },
  signatures: { flexDirection: 'row', gap: 32, marginTop: 28 },
  signature: { flex: 1, gap: 4 },
  line: { borderBottomWidth: 1, borderColor: INK, height: 24 },
  small: { color: INK, fontSize: 10 },
});
