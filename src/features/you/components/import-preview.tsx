import { StyleSheet, View } from 'react-native';
import type { CheckedRow } from '@shared/transfer/import-log';
import { DataTable } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import { formatCount as count } from '@/lib/format';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { fonts, radius, space } from '@/theme/tokens';

const flags = (row: CheckedRow) => [row.row?.star ? '★ star' : null, row.row?.pulled ? 'pulled' : null].filter(Boolean).join(' · ');

/** Every row's verdict before anything is sent: how many are ready, why each bad one is left out, the first good ones. */
export function ImportPreview({ good, bad }: { good: CheckedRow[]; bad: CheckedRow[] }) {
  const theme = useTheme();
  const { isWide } = useLayout();
  return (
    <>
      <Text variant="label" tone="muted">
        PREVIEW
      </Text>
      <Text testID="import-verdict">
        {count(good.length)} {good.length === 1 ? 'row is' : 'rows are'} ready
        {bad.length ? `, ${count(bad.length)} ${bad.length === 1 ? 'has a problem and is' : 'have problems and are'} left out` : ''}.
      </Text>
      {bad.length ? (
        <View style={[styles.problems, { borderColor: theme.line }]} testID="import-problems">
          {bad.slice(0, 50).map((row) => (
            <Text key={row.line} variant="caption">
              <Text variant="caption" style={styles.mono}>
                line {row.line}
                {row.serial ? ` · ${row.serial}` : ''}
              </Text>
              {' — '}
              <Text variant="caption" tone="danger">
                {row.problems.join('; ')}
              </Text>
            </Text>
          ))}
          {bad.length > 50 ? (
            <Text variant="caption" tone="muted">
              …and {count(bad.length - 50)} more.
            </Text>
          ) : null}
        </View>
      ) : null}
      {good.length ? (
        <DataTable
          label="First rows to import"
          rowKey={(row) => String(row.line)}
          rows={good.slice(0, 6)}
          columns={[
            ...(isWide ? [{ key: 'line', header: 'Line', width: 52, cell: (row: CheckedRow) => <Text style={styles.mono}>{row.line}</Text> }] : []),
            {
              key: 'serial',
              header: 'Serial',
              flex: 2,
              cell: (row: CheckedRow) => (
                <View>
                  <Text style={[styles.mono, styles.small]}>{row.serial}</Text>
                  {!isWide && (row.row?.star || row.row?.pulled) ? (
                    <Text variant="caption" tone="muted">
                      {flags(row)}
                    </Text>
                  ) : null}
                </View>
              ),
            },
            { key: 'date', header: 'Date', width: 108, cell: (row: CheckedRow) => <Text style={[styles.mono, styles.small]}>{row.row?.date?.slice(0, 10) ?? '—'}</Text> },
            ...(isWide ? [{ key: 'flags', header: 'Star · pulled', flex: 1.2, cell: (row: CheckedRow) => <Text>{flags(row) || '—'}</Text> }] : []),
          ]}
          testID="import-preview"
        />
      ) : null}

    </>
  );
}

const styles = StyleSheet.create({
  mono: { fontFamily: fonts.mono },
  small: { fontSize: 14 },
  problems: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm, gap: space.xs, maxHeight: 260, overflow: 'scroll' },
});
