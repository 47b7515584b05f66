import { Pressable, StyleSheet, View } from 'react-native';
import type { HuntSummary } from '@shared/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { PatternBadges } from '@/components/ui/pattern-badges';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { caption, formatCount, formatDate } from '@/lib/format';

function BestFind({ hunt }: { hunt: HuntSummary }) {
  const theme = useTheme();
  if (!hunt.bestFind) {
    return (
      <Text variant="caption" tone="faint">
        no finds yet
      </Text>
    );
  }
  return (
    <View style={styles.best} accessibilityLabel={`Best find ${hunt.bestFind.serial}`}>
      <Text style={[styles.serial, { color: theme.hit }]}>{hunt.bestFind.digits}</Text>
      <PatternBadges patterns={hunt.bestFind.patterns.slice(0, 2)} />
    </View>
  );
}

function Status({ hunt }: { hunt: HuntSummary }) {
  return (
    <View style={styles.status}>
      <Badge label={hunt.status} tone={hunt.status === 'open' ? 'ok' : 'neutral'} accessibilityLabel={`Status: ${hunt.status}`} />
      {hunt.role === 'crew' ? <Badge label="crew" tone="near" accessibilityLabel={`Crew of ${hunt.owner.displayName}`} /> : null}
    </View>
  );
}

/** A phone's list: one card a hunt, the figures a hunter scans for on one line. */
export function HuntCards({ hunts, onOpen }: { hunts: readonly HuntSummary[]; onOpen(id: string): void }) {
  const theme = useTheme();
  return (
    <View role="list" aria-label="Hunts" style={styles.cards} testID="hunt-cards">
      {hunts.map((hunt) => (
        <View key={hunt.id} role="listitem">
        <Pressable
          accessibilityRole="button"
          accessibilityHint="Opens the hunt"
          onPress={() => onOpen(hunt.id)}
          testID={`hunt-card-${hunt.id}`}
          style={({ pressed }) => [
            styles.card,
            { borderColor: theme.line, backgroundColor: pressed ? theme.surfaceSunken : theme.surfaceRaised },
          ]}
        >
          <View style={styles.cardHead}>
            <View style={styles.grow}>
              <Text bold numberOfLines={1}>
                {hunt.title}
              </Text>
              <Text variant="caption" tone="muted" numberOfLines={1}>
                {caption(formatDate(hunt.startedAt), hunt.source, `$${hunt.denomination}`)}
              </Text>
            </View>
            <Status hunt={hunt} />
          </View>
          <View style={styles.figures}>
            <Text variant="caption" tone="muted">
              <Text variant="mono">{formatCount(hunt.notesSearched)}</Text> notes
            </Text>
            <Text variant="caption" tone="muted">
              <Text variant="mono" tone={hunt.hits ? 'hit' : 'ink'}>
                {formatCount(hunt.hits)}
              </Text>{' '}
              {hunt.hits === 1 ? 'find' : 'finds'}
            </Text>
            <Text variant="caption" tone="muted">
              <Text variant="mono">{formatCount(hunt.pulled)}</Text> pulled
            </Text>
          </View>
          <BestFind hunt={hunt} />
        </Pressable>
        </View>
      ))}
    </View>
  );
}

/** A desk's list: a table with every hunt's figures side by side. */
export function HuntTable({ hunts, onOpen }: { hunts: readonly HuntSummary[]; onOpen(id: string): void }) {
  const columns: Column<HuntSummary>[] = [
    { key: 'date', header: 'Date', width: 150, cell: (hunt) => <Text variant="caption">{formatDate(hunt.startedAt)}</Text> },
    {
      key: 'title',
      header: 'Hunt · source',
      flex: 2.2,
      cell: (hunt) => (
        <View style={styles.grow}>
          <Text bold numberOfLines={1}>
            {hunt.title}
          </Text>
          <Text variant="caption" tone="muted" numberOfLines={1}>
            {caption(hunt.source, `$${hunt.denomination}`)}
          </Text>
        </View>
      ),
    },
    { key: 'notes', header: 'Notes searched', align: 'right', width: 130, cell: (hunt) => hunt.notesSearched },
    {
      key: 'hits',
      header: 'Finds',
      align: 'right',
      width: 70,
      cell: (hunt) => (
        <Text variant="mono" tone={hunt.hits ? 'hit' : 'ink'}>
          {formatCount(hunt.hits)}
        </Text>
      ),
    },
    { key: 'best', header: 'Best find', flex: 2.2, cell: (hunt) => <BestFind hunt={hunt} /> },
    { key: 'status', header: 'Status', width: 120, cell: (hunt) => <Status hunt={hunt} /> },
    {
      key: 'open',
      header: '',
      width: 84,
      align: 'right',
      cell: (hunt) => (
        <Button
          compact
          kind="secondary"
          label="Open"
          accessibilityLabel={`Open hunt ${hunt.title}`}
          onPress={() => onOpen(hunt.id)}
          testID={`hunt-open-${hunt.id}`}
        />
      ),
    },
  ];
  return <DataTable label="Hunts" columns={columns} rows={hunts} rowKey={(hunt) => hunt.id} testID="hunt-table" />;
}

const styles = StyleSheet.create({
  cards: { gap: space.sm },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.md, gap: space.sm },
  cardHead: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  grow: { flex: 1, minWidth: 0 },
  figures: { flexDirection: 'row', gap: space.lg, flexWrap: 'wrap' },
  // Shrinks inside its table cell so the badges wrap instead of running into the next column.
  best: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap', flexShrink: 1, minWidth: 0 },
  serial: { fontFamily: fonts.monoMedium, fontSize: 15, fontVariant: ['tabular-nums'] },
  status: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
});
