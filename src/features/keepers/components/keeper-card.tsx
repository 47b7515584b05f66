import { Pressable, StyleSheet, View } from 'react-native';
import { PATTERN_NAMES } from '@shared/engine';
import type { KeeperSummary } from '@shared/contracts';
import { gradeLabel } from '@shared/trade';
import { Badge } from '@/components/ui/badge';
import { Text } from '@/components/ui/text';
import { formatCents } from '@/lib/money';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { PhotoImage } from './photo-image';

const STATUS_LABEL = { kept: 'kept', traded: 'traded', sold: 'sold', spent: 'spent back' } as const;

export function keeperTitle(keeper: KeeperSummary): string {
  return `${keeper.prefix ? `${keeper.prefix} ` : ''}${keeper.digits}${keeper.suffix ? ` ${keeper.suffix}` : ''}${keeper.star ? ' ★' : ''}`;
}

/** One keeper as a card (phones) or a table row (wide screens); the whole thing opens the keeper. */
export function KeeperCard({ keeper, onOpen, asRow }: { keeper: KeeperSummary; onOpen(): void; asRow?: boolean }) {
  const theme = useTheme();
  const meta = [
    keeper.series ? `Series ${keeper.series}` : null,
    keeper.district ? `District ${keeper.district}` : null,
    keeper.facility === 'FW' ? 'FW' : null,
    keeper.denomination ? `$${keeper.denomination}` : null,
  ].filter(Boolean);
  return (
    <Pressable
      accessibilityRole="link"
      onPress={onOpen}
      testID={`keeper-${keeper.digits}`}
      style={({ hovered }: { hovered?: boolean }) => [
        asRow ? styles.row : styles.card,
        { borderColor: theme.line, backgroundColor: hovered ? theme.surfaceSunken : asRow ? 'transparent' : theme.surfaceRaised },
      ]}
    >
      {keeper.thumbUrl ? (
        <PhotoImage path={keeper.thumbUrl} label="Front photo" style={asRow ? styles.thumbRow : styles.thumbCard} testID={`keeper-thumb-${keeper.digits}`} />
      ) : asRow ? (
        <View style={[styles.thumbRow, styles.noThumb, { borderColor: theme.line }]} />
      ) : null}
      <View style={asRow ? styles.serialCol : undefined}>
        <Text style={[styles.serial, { color: keeper.patterns.length ? theme.hit : theme.ink }]}>{keeperTitle(keeper)}</Text>
        <Text variant="caption" tone="muted">
          {meta.join(' · ') || 'No details yet'}
        </Text>
      </View>
      <View style={[styles.badges, asRow && styles.patternsCol]}>
        {keeper.patterns.map((id) => (
          <Badge key={id} label={PATTERN_NAMES[id]} tone="hit" />
        ))}
        {keeper.star ? <Badge label="★ star" tone="hit" /> : null}
      </View>
      <View style={asRow ? styles.figuresRow : styles.figures}>
        <Text style={styles.figure}>{keeper.points} pts</Text>
        <Text style={styles.figure}>{keeper.grade ? gradeLabel(keeper.grade) : 'ungraded'}</Text>
        <Text style={styles.figure}>{formatCents(keeper.estimatedValueCents)}</Text>
        <Badge label={STATUS_LABEL[keeper.status]} tone={keeper.status === 'kept' ? 'ok' : 'neutral'} />
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.lg, paddingVertical: space.md, paddingHorizontal: space.sm, borderBottomWidth: 1, borderRadius: radius.sm },
  serialCol: { width: 240, gap: 2 },
  // Thumbnails keep a note's proportions (about 2.35 : 1).
  thumbRow: { width: 80, height: 34, borderRadius: radius.sm },
  thumbCard: { width: 120, height: 51, borderRadius: radius.sm },
  noThumb: { borderWidth: 1, borderStyle: 'dashed' },
  patternsCol: { flex: 1 },
  serial: { fontFamily: fonts.monoMedium, fontSize: 20, fontVariant: ['tabular-nums'] },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
  figuresRow: { flexDirection: 'row', gap: space.lg, alignItems: 'center', width: 380, justifyContent: 'flex-end' },
  figure: { fontFamily: fonts.mono, fontSize: 14, fontVariant: ['tabular-nums'] },
});
