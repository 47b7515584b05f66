import { Image, ScrollView, StyleSheet, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import type { SharedKeeper } from '@shared/contracts';
import { districtByLetter, gradeBand } from '@shared/trade';
import { Badge } from '@/components/ui/badge';
import { Notice } from '@/components/ui/notice';
import { PageHeading } from '@/components/ui/page-heading';
import { Text } from '@/components/ui/text';
import { ApiError, absoluteApiUrl } from '@/lib/api/client';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { fonts, fontSize, radius, space } from '@/theme/tokens';
import { formatOneIn } from '@/lib/format';
import { useSharedKeeper } from './api';

/** "65 (Gem Uncirculated)": the band, so a 65 is not read as a plain Unc. */
function gradeText(grade: number | null): string {
  if (grade === null) return 'not graded';
  const band = gradeBand(grade);
  return band ? `${grade} (${band.name})` : String(grade);
}

function Facts({ keeper }: { keeper: SharedKeeper }) {
  const theme = useTheme();
  const district = keeper.district ? districtByLetter(keeper.district) : null;
  const rows: Array<[string, string]> = [
    ['Series', keeper.series ?? '—'],
    ['District', district ? `${district.letter} · ${district.number} · ${district.bank}` : (keeper.district ?? '—')],
    ['Printed', keeper.facility === 'FW' ? 'Fort Worth (FW mark)' : keeper.facility === 'DC' ? 'Washington, DC' : '—'],
    ['Face value', keeper.denomination ? `$${keeper.denomination}` : '—'],
    ['Grade', gradeText(keeper.grade)],
  ];
  return (
    <View style={styles.facts}>
      {rows.map(([label, value]) => (
        <View key={label} style={[styles.factRow, { borderBottomColor: theme.line }]}>
          <Text tone="muted" style={styles.factLabel}>
            {label}
          </Text>
          <Text style={styles.factValue}>{value}</Text>
        </View>
      ))}
    </View>
  );
}

/**
 * The page a share link opens, signed in or not: one note — serial, patterns with their odds, grade and
 * photos — and nothing about the person who shared it.
 */
export function ShareScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const theme = useTheme();
  const { isWide } = useLayout();
  const shared = useSharedKeeper(typeof token === 'string' && token ? token : null);
  const keeper = shared.data;
  const gone = shared.error instanceof ApiError && (shared.error.status === 404 || shared.error.status === 400);
  const title = keeper ? `${keeper.prefix ? `${keeper.prefix} ` : ''}${keeper.digits}${keeper.suffix ? ` ${keeper.suffix}` : ''}${keeper.star ? ' ★' : ''}` : '';

  return (
    <ScrollView style={{ backgroundColor: theme.surface }} contentContainerStyle={styles.scroll}>
      <View role="main" style={[styles.column, { maxWidth: isWide ? 880 : 520 }]}>
        <View style={styles.brand}>
          <View style={[styles.mark, { backgroundColor: theme.brand }]}>
            <Text style={[styles.markText, { color: theme.onBrand }]}>S</Text>
          </View>
          <View style={styles.brandText}>
            <PageHeading style={styles.pageTitle}>A note shared from Strapsift</PageHeading>
            <Text tone="muted">A collector&apos;s find, shown read-only.</Text>
          </View>
        </View>

        {shared.isLoading ? <Text tone="muted">Loading the note…</Text> : null}
        {gone ? (
          <Notice tone="caution" title="Nothing to show">
            This link does not exist, or its owner withdrew it.
          </Notice>
        ) : shared.error ? (
          <Notice tone="error">The note could not be loaded. Check the connection and try again.</Notice>
        ) : null}

        {keeper ? (
          <View style={[styles.card, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }]} testID="shared-keeper">
            <Text role="heading" aria-level={2} style={[styles.serial, { color: keeper.patterns.length ? theme.hit : theme.ink }]} testID="shared-serial">
              {title}
            </Text>
            <View style={styles.badges}>
              {keeper.patterns.length ? (
                keeper.patterns.map((pattern) => (
                  <Badge key={pattern.id} label={`${pattern.name} · ${formatOneIn(pattern.oneIn ?? Infinity)}`} tone="hit" accessibilityLabel={`Pattern: ${pattern.name}`} />
                ))
              ) : (
                <Badge label="no pattern" />
              )}
              {keeper.star ? <Badge label="★ star note" tone="near" /> : null}
            </View>
            <View style={[styles.body, isWide && styles.bodyWide]}>
              <View style={isWide ? styles.factsWide : undefined}>
                <Facts keeper={keeper} />
              </View>
              {keeper.photos.length ? (
                <View style={[styles.photos, isWide && styles.photosWide]}>
                  {keeper.photos.map((photo) => (
                    <View key={photo.id} style={styles.photo}>
                      <Text variant="label" tone="muted">
                        {photo.side.toUpperCase()}
                      </Text>
                      <Image
                        source={{ uri: absoluteApiUrl(photo.url) }}
                        style={[styles.image, { aspectRatio: photo.width / Math.max(1, photo.height), backgroundColor: theme.surfaceSunken }]}
                        resizeMode="contain"
                        accessibilityLabel={`${photo.side} of the note`}
                        testID={`shared-photo-${photo.side}`}
                      />
                    </View>
                  ))}
                </View>
              ) : null}
            </View>
          </View>
        ) : null}

        <Text variant="caption" tone="faint" style={styles.footer}>
          Odds are exact counts over the serials 00000001–99999999. Photos are the owner&apos;s records of their note, shown here one side and
          small: many countries restrict pictures of banknotes (in the US, 18 U.S.C. § 504 and 31 CFR Part 411).
        </Text>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, padding: space.lg, paddingBottom: space.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: space.lg },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  brandText: { flexShrink: 1 },
  pageTitle: { fontSize: fontSize.lg, fontWeight: '600', letterSpacing: 0 },
  mark: { width: 44, height: 44, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center' },
  markText: { fontFamily: fonts.monoBold, fontSize: 24 },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.xl, gap: space.lg },
  serial: { fontFamily: fonts.monoMedium, fontSize: 30, fontVariant: ['tabular-nums'] },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  body: { gap: space.lg },
  bodyWide: { flexDirection: 'row', alignItems: 'flex-start' },
  factsWide: { width: 300 },
  facts: { gap: 0 },
  factRow: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  factLabel: { flexShrink: 0 },
  factValue: { fontFamily: fonts.mono, textAlign: 'right', flexShrink: 1 },
  photos: { gap: space.lg },
  photosWide: { flex: 1 },
  photo: { gap: space.xs },
  // Small on purpose (TRADE.md): the thumbnail at no more than its own 320 px.
  image: { width: '100%', maxWidth: 320, borderRadius: radius.sm },
  footer: { textAlign: 'center' },
});
