import { router } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { useHuntPages, type HuntFilter } from './api';
import { HuntCards, HuntTable } from './components/hunt-list';

type FilterChoice = 'all' | 'open' | 'closed';
const FILTERS = [
  { value: 'all', label: 'All' },
  { value: 'open', label: 'Open' },
  { value: 'closed', label: 'Closed' },
] as const;

export function HuntsScreen() {
  const theme = useTheme();
  const { isWide } = useLayout();
  const [filter, setFilter] = useState<FilterChoice>('all');
  const status: HuntFilter = filter === 'all' ? undefined : filter;
  const { data, error, isLoading, size, setSize, isValidating, mutate } = useHuntPages(status);

  const hunts = data?.flatMap((page) => page.items) ?? [];
  const hasMore = !!data?.[data.length - 1]?.nextCursor;
  const loadingMore = isValidating && !!data && data.length < size;
  const open = (id: string) => router.push(`/hunts/${id}`);

  return (
    <Screen
      title="Hunts"
      subtitle="Every session you sifted, strap by strap."
      actions={
        <>
          <Button kind="secondary" label="Tally" accessibilityLabel="Open the Tally: find rates against chance" onPress={() => router.push('/tally')} testID="open-tally" />
          <Button kind="secondary" label="Sweep" accessibilityLabel="Open Sweep: list the finds in a run of new notes" onPress={() => router.push('/sweep')} testID="open-sweep" />
        </>
      }
    >
      <ChoiceRow<FilterChoice> label="Show" options={FILTERS} value={filter} onChange={setFilter} testID="hunt-filter" />
      {isLoading ? (
        <View style={styles.center} accessibilityLabel="Loading hunts">
          <ActivityIndicator color={theme.brand} />
          <Text tone="muted">Loading hunts…</Text>
        </View>
      ) : error && !data ? (
        <View style={styles.gap}>
          <Notice tone="error" title="Hunts could not be loaded">
            {error instanceof Error ? error.message : 'Something went wrong.'}
          </Notice>
          <Button kind="secondary" label="Try again" onPress={() => void mutate()} style={styles.alignStart} />
        </View>
      ) : hunts.length === 0 ? (
        <View style={styles.gap} testID="hunts-empty">
          <Notice tone="info" title={filter === 'all' ? 'No hunts yet' : `No ${filter} hunts`}>
            {filter === 'all'
              ? 'A hunt is one session of searching straps. Start one on the Sift tab, or from a run of new notes on Sweep.'
              : 'Choose All to see every hunt.'}
          </Notice>
          {filter === 'all' ? <Button label="Start sifting" onPress={() => router.push('/sift')} style={styles.alignStart} /> : null}
        </View>
      ) : (
        <View style={styles.gap}>
          {isWide ? <HuntTable hunts={hunts} onOpen={open} /> : <HuntCards hunts={hunts} onOpen={open} />}
          {hasMore ? (
            <Button
              kind="secondary"
              label="Show older hunts"
              busy={loadingMore}
              onPress={() => void setSize(size + 1)}
              style={styles.alignStart}
              testID="hunts-more"
            />
          ) : null}
          {error ? <Notice tone="caution">{`Some hunts could not be refreshed: ${error instanceof Error ? error.message : 'unknown error'}`}</Notice> : null}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  center: { alignItems: 'center', gap: space.sm, paddingVertical: space.xxl },
  gap: { gap: space.md },
  alignStart: { alignSelf: 'flex-start' },
});
