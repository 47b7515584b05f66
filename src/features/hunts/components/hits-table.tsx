import { StyleSheet, View } from 'react-native';
import type { ScanView } from '@shared/contracts';
import { Badge } from '@/components/ui/badge';
import { DataTable, type Column } from '@/components/ui/data-table';
import { PatternBadges } from '@/components/ui/pattern-badges';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { formatDate } from '@/lib/format';

/** The serial as printed on the note: prefix, digits, then the suffix letter or the star. */
export function serialText(scan: Pick<ScanView, 'prefix' | 'digits' | 'suffix' | 'star'>): string {
  return [scan.prefix, scan.digits, scan.star ? '★' : scan.suffix].filter(Boolean).join(' ');
}

const when = (iso: string) => formatDate(iso, 'moment');

function Fate({ scan }: { scan: ScanView }) {
  if (scan.pulled) return <Badge label="pulled" tone="ok" accessibilityLabel="Pulled from the strap" />;
  if (scan.keep) return <Badge label="keep?" tone="near" accessibilityLabel="Scored as a keeper but left in the strap" />;
  return (
    <Text variant="caption" tone="faint">
      left in
    </Text>
  );
}

interface HitsTableProps {
  /** Notes with at least one pattern, newest first. */
  hits: readonly ScanView[];
  wide: boolean;
  /** A crew hunt says who logged each note. */
  showLoggedBy: boolean;
}

/** Every hit of a hunt: the serial, its patterns, its points, the strap it came from and what became of it. */
export function HitsTable({ hits, wide, showLoggedBy }: HitsTableProps) {
  const theme = useTheme();
  if (!wide) {
    return (
      <View role="list" aria-label={`Finds, ${hits.length} notes`} style={styles.cards} testID="hits-table">
        {hits.map((scan) => (
          <View
            key={scan.id}
            role="listitem"
            testID={`hit-${scan.digits}`}
            style={[styles.card, { borderColor: theme.line, backgroundColor: theme.surfaceRaised }]}
          >
            <View style={styles.cardHead}>
              <Text style={[styles.serial, { color: theme.hit }]}>{serialText(scan)}</Text>
              <Text variant="mono" tone="muted">
                {scan.points.toFixed(1)} pts
              </Text>
            </View>
            <PatternBadges patterns={scan.patterns} />
            <View style={styles.cardFoot}>
              <Text variant="caption" tone="muted">
                strap {scan.strap} · {when(scan.scannedAt)}
                {showLoggedBy ? ` · ${scan.loggedBy.displayName}` : ''}
              </Text>
              <Fate scan={scan} />
            </View>
          </View>
        ))}
      </View>
    );
  }
  const columns: Column<ScanView>[] = [
    {
      key: 'serial',
      header: 'Serial',
      width: 164,
      cell: (scan) => (
        <Text style={[styles.serial, { color: theme.hit }]} numberOfLines={1}>
          {serialText(scan)}
        </Text>
      ),
    },
    { key: 'patterns', header: 'Patterns', flex: 2.2, cell: (scan) => <PatternBadges patterns={scan.patterns} /> },
    { key: 'points', header: 'Points', align: 'right', width: 72, cell: (scan) => <Text variant="mono">{scan.points.toFixed(1)}</Text> },
    { key: 'strap', header: 'Strap', align: 'right', width: 64, cell: (scan) => scan.strap },
    { key: 'fate', header: 'Kept', width: 90, cell: (scan) => <Fate scan={scan} /> },
    ...(showLoggedBy
      ? [
          {
            key: 'by',
            header: 'Logged by',
            flex: 1.2,
            cell: (scan: ScanView) => (
              <Text variant="caption" numberOfLines={1}>
                {scan.loggedBy.displayName}
              </Text>
            ),
          },
        ]
      : []),
    { key: 'when', header: 'When', width: 124, cell: (scan) => <Text variant="caption" tone="muted">{when(scan.scannedAt)}</Text> },
  ];
  return (
    <DataTable
      label={`Finds, ${hits.length} notes`}
      columns={columns}
      rows={hits}
      rowKey={(scan) => scan.id}
      testID="hits-table"
    />
  );
}

const styles = StyleSheet.create({
  serial: { fontFamily: fonts.monoMedium, fontSize: 16, fontVariant: ['tabular-nums'] },
  cards: { gap: space.sm },
  card: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
  cardFoot: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
});
