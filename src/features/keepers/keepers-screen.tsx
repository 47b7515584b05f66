import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import useSWRInfinite from 'swr/infinite';
import { keeperList, type KeeperList, type KeeperSort, type KeeperStatus } from '@shared/contracts';
import { PATTERN_IDS, PATTERN_NAMES, type PatternId } from '@shared/engine';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { api } from '@/lib/api/client';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { keeperKeys } from './api';
import { KeeperCard } from './components/keeper-card';
import { useDebounced } from '@/lib/use-debounced';

const SORTS: { value: KeeperSort; label: string }[] = [
  { value: 'newest', label: 'Newest' },
  { value: 'points', label: 'Points' },
  { value: 'value', label: 'Value' },
  { value: 'grade', label: 'Grade' },
  { value: 'serial', label: 'Serial' },
];
const STATUSES: { value: '' | KeeperStatus; label: string }[] = [
  { value: '', label: 'All' },
  { value: 'kept', label: 'Kept' },
  { value: 'traded', label: 'Traded' },
  { value: 'sold', label: 'Sold' },
  { value: 'spent', label: 'Spent back' },
];
type GradeBand = '' | 'ungraded' | 'circulated' | 'au' | 'unc' | 'choice' | 'gem' | 'superb';
const within = (from: number, to: number) => (grade: number | null) => grade != null && grade >= from && grade <= to;
// The bands a new note from a strap is judged in (TRADE.md): a 65 is Gem, not just "Unc".
const GRADE_BANDS: { value: GradeBand; label: string; test: (grade: number | null) => boolean }[] = [
  { value: '', label: 'Any', test: () => true },
  { value: 'ungraded', label: 'Ungraded', test: (grade) => grade == null },
  { value: 'circulated', label: '1–49', test: within(1, 49) },
  { value: 'au', label: 'AU 50–59', test: within(50, 59) },
  { value: 'unc', label: 'Unc 60–62', test: within(60, 62) },
  { value: 'choice', label: 'Choice 63–64', test: within(63, 64) },
  { value: 'gem', label: 'Gem 65–66', test: within(65, 66) },
  { value: 'superb', label: 'Superb Gem 67+', test: within(67, 70) },
];

const PATTERN_FILTERS: { value: '' | PatternId | 'star'; label: string }[] = [
  { value: '', label: 'Any' },
  { value: 'star', label: '★ star' },
  ...PATTERN_IDS.map((id) => ({ value: id, label: PATTERN_NAMES[id] })),
];

export function KeepersScreen() {
  const { isWide } = useLayout();
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<KeeperSort>('newest');
  const [status, setStatus] = useState<'' | KeeperStatus>('');
  const [pattern, setPattern] = useState<'' | PatternId | 'star'>('');
  const [grade, setGrade] = useState<GradeBand>('');
  const [showFilters, setShowFilters] = useState(false);
  const query = useDebounced(search, 250);

  const pages = useSWRInfinite<KeeperList>(
    (index, previous: KeeperList | null) => {
      if (previous && !previous.nextCursor) return null;
      return keeperKeys.list({ query, sort, status: status || undefined, cursor: previous?.nextCursor ?? undefined, limit: 50 });
    },
    (path: string) => api(path, { schema: keeperList }),
  );
  const all = useMemo(() => (pages.data ?? []).flatMap((page) => page.items), [pages.data]);
  // Pattern, star and grade narrow the loaded list on the device; search (serial, series, district,
  // notes), sort and status run on the server.
  const shown = useMemo(() => {
    const band = GRADE_BANDS.find((item) => item.value === grade) ?? GRADE_BANDS[0];
    return all.filter(
      (keeper) => (pattern === '' ? true : pattern === 'star' ? keeper.star : keeper.patterns.includes(pattern)) && band.test(keeper.grade),
    );
  }, [all, pattern, grade]);
  const last = pages.data?.[pages.data.length - 1];

  return (
    <Screen
      title="Keepers"
      subtitle="The notes you pulled, what they are, and what became of them."
      actions={<Button label="Add a keeper" onPress={() => router.push('/keepers/new')} testID="add-keeper" />}
    >
      <View style={[styles.controls, isWide && styles.controlsWide]}>
        <View style={styles.search}>
          <Field label="Search" value={search} onChangeText={setSearch} placeholder="serial, series (2017A), district letter or notes" autoCapitalize="none" testID="keeper-search" />
        </View>
        <ChoiceRow label="Sort by" options={SORTS} value={sort} onChange={(value) => setSort(value as KeeperSort)} />
      </View>
      {!isWide ? (
        <Button compact kind="quiet" label={showFilters ? 'Hide filters' : 'Filters'} onPress={() => setShowFilters(!showFilters)} style={styles.filterToggle} />
      ) : null}
      {showFilters || isWide ? (
        <View style={styles.filters}>
          <ChoiceRow label="Status" options={STATUSES} value={status} onChange={(value) => setStatus(value as '' | KeeperStatus)} />
          <ChoiceRow label="Pattern" options={PATTERN_FILTERS} value={pattern} onChange={(value) => setPattern(value as '' | PatternId | 'star')} />
          <ChoiceRow label="Grade" options={GRADE_BANDS} value={grade} onChange={(value) => setGrade(value as GradeBand)} />
        </View>
      ) : null}

      {pages.error && !pages.data ? <Notice tone="error">Your keepers could not be loaded. Check the connection and try again.</Notice> : null}
      {pages.isLoading ? <Text tone="muted">Loading your keepers…</Text> : null}
      {pages.data && shown.length === 0 ? (
        <Notice tone="info" title={all.length ? 'Nothing matches' : 'No keepers yet'}>
          {all.length ? 'Try another search or filter.' : 'A note you pull in Sift joins them when you tap “Add to keepers” beside it under the last notes. A note you already own: “Add a keeper”.'}
        </Notice>
      ) : null}
      <View style={isWide ? styles.table : styles.cards} testID="keeper-list">
        {shown.map((keeper) => (
          <KeeperCard key={keeper.id} keeper={keeper} asRow={isWide} onOpen={() => router.push(`/keepers/${keeper.id}`)} />
        ))}
      </View>
      {last?.nextCursor ? <Button kind="secondary" label="Show more" busy={pages.isValidating} onPress={() => void pages.setSize(pages.size + 1)} /> : null}
      <Text variant="caption" tone="faint">
        Values are your own estimates, not appraisals. Keep what you hold private.
      </Text>
    </Screen>
  );
}

const styles = StyleSheet.create({
  controls: { gap: space.md },
  controlsWide: { flexDirection: 'row', alignItems: 'flex-end' },
  search: { flex: 1, minWidth: 240 },
  filterToggle: { alignSelf: 'flex-start' },
  filters: { gap: space.md },
  cards: { gap: space.md },
  table: { gap: 0 },
});
