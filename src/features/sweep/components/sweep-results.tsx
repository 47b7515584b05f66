import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { PATTERN_IDS, PATTERN_NAMES, type ParsedSerial, type SweepHit, type SweepResult } from '@shared/engine';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { PatternBadges } from '@/components/ui/pattern-badges';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, space } from '@/theme/tokens';
import { fullSerial, position } from '../sweep-input';
import { formatCount } from '@/lib/format';

/** Rows drawn at once: a brick of new notes rarely has more hits; a 10-million sweep pages. */
export const SWEEP_PAGE = 100;

const count = formatCount;

/** "12 finds in 4,000 notes, 12345600 to 12349599". */
export function sweepHeadline(result: SweepResult): string {
  const first = String(result.first).padStart(8, '0');
  const last = String(result.last).padStart(8, '0');
  const hits = result.hits.length;
  return `${count(hits)} ${hits === 1 ? 'find' : 'finds'} in ${count(result.count)} ${result.count === 1 ? 'note' : 'notes'}, ${first} to ${last}`;
}

interface SweepResultsProps {
  result: SweepResult;
  serial: Pick<ParsedSerial, 'prefix' | 'suffix' | 'star'>;
  wide: boolean;
}

/** The hits of a sweep with how far each sits from the first note, a page at a time. */
export function SweepResults({ result, serial, wide }: SweepResultsProps) {
  const theme = useTheme();
  const [page, setPage] = useState(0);
  const pages = Math.max(1, Math.ceil(result.hits.length / SWEEP_PAGE));
  const shown = result.hits.slice(page * SWEEP_PAGE, (page + 1) * SWEEP_PAGE);
  const spansStraps = result.count > 100;

  const tally = PATTERN_IDS.map((id) => ({ id, hits: result.hits.filter((hit) => hit.patterns.includes(id)).length })).filter(
    (row) => row.hits > 0,
  );

  const columns: Column<SweepHit>[] = [
    {
      key: 'serial',
      header: 'Serial',
      flex: wide ? 1.4 : 1.5,
      cell: (hit) => <Text style={[styles.serial, { color: theme.hit }]}>{fullSerial(hit.serial, serial)}</Text>,
    },
    {
      key: 'away',
      header: 'Notes away',
      align: 'right',
      flex: wide ? 0.8 : 0.9,
      cell: (hit) => position(hit.value, result.first).away,
    },
    ...(spansStraps && wide
      ? [
          {
            key: 'strap',
            header: 'Strap · note',
            align: 'right' as const,
            flex: 0.8,
            cell: (hit: SweepHit) => {
              const at = position(hit.value, result.first);
              return (
                <Text variant="mono" tone="muted">
                  {at.strap} · {at.inStrap}
                </Text>
              );
            },
          },
        ]
      : []),
    { key: 'patterns', header: 'Patterns', flex: wide ? 2.2 : 1.6, cell: (hit) => <PatternBadges patterns={hit.patterns} /> },
  ];

  return (
    <View style={styles.wrap} testID="sweep-results">
      <Text variant="heading" accessibilityRole="header" aria-level={2} testID="sweep-headline">
        {sweepHeadline(result)}
      </Text>
      {result.truncated ? (
        <Text tone="warn">
          {result.last === 99_999_999
            ? 'The run reaches 99999999, the last serial, so the sweep stops there.'
            : `The run passes ${String(result.last).padStart(8, '0')}, where circulating notes of this face value stop (uncut sheets only above it), so the sweep stops there.`}
        </Text>
      ) : null}
      {tally.length ? (
        <View style={styles.tally} accessibilityLabel={`By pattern: ${tally.map((row) => `${PATTERN_NAMES[row.id]} ${row.hits}`).join(', ')}`}>
          {tally.map((row) => (
            <Badge key={row.id} label={`${PATTERN_NAMES[row.id]} · ${count(row.hits)}`} tone="neutral" />
          ))}
        </View>
      ) : (
        <Text tone="muted">No serial in this run has any of the chosen patterns.</Text>
      )}
      {result.hits.length ? (
        <DataTable
          label={`Finds of the sweep, ${count(result.hits.length)} serials${pages > 1 ? `, page ${page + 1} of ${pages}` : ''}`}
          columns={columns}
          rows={shown}
          rowKey={(hit) => hit.serial}
          testID="sweep-table"
        />
      ) : null}
      {pages > 1 ? (
        <View style={styles.pager}>
          <Button compact kind="secondary" label="‹ Previous" onPress={() => setPage(page - 1)} disabled={page === 0} testID="sweep-previous" />
          <Text tone="muted" testID="sweep-page">
            Finds {count(page * SWEEP_PAGE + 1)}–{count(page * SWEEP_PAGE + shown.length)} of {count(result.hits.length)}
          </Text>
          <Button compact kind="secondary" label="Next ›" onPress={() => setPage(page + 1)} disabled={page >= pages - 1} testID="sweep-next" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  tally: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  serial: { fontFamily: fonts.monoMedium, fontSize: 15, fontVariant: ['tabular-nums'] },
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
});
