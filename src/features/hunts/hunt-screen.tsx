import { router, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { AsyncBlock } from '@/components/ui/async-block';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Stat, StatRow } from '@/components/ui/stat';
import { ApiError } from '@/lib/api/api-error';
import { caption, formatCount, formatDate, formatRate } from '@/lib/format';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { useSiftSession } from '../sift/use-sift-session';
import { useHunt } from './api';
import { ChanceBlock } from './sections/chance-block';
import { CrewBlock } from './sections/crew-block';
import { DetailsBlock } from './sections/details-block';
import { FindsSection } from './sections/finds-section';
import { ManageBlock } from './sections/manage-block';
import { StrapSheetSection } from './sections/strap-sheet-section';

const back = () => (router.canGoBack() ? router.back() : router.replace('/hunts'));

export function HuntScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const huntId = typeof id === 'string' && id ? id : null;
  const { isWide } = useLayout();
  const hunt = useHunt(huntId);
  const sift = useSiftSession(undefined);

  if (!hunt.data) {
    const missing = hunt.error instanceof ApiError && (hunt.error.status === 404 || hunt.error.status === 400);
    return (
      <Screen title="Hunt" actions={<Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={back} />}>
        {missing ? (
          <Notice tone="caution" title="No such hunt">
            It may have been deleted, or you are no longer in its crew.
          </Notice>
        ) : (
          <AsyncBlock what="hunt" data={hunt.data} error={hunt.error} retry={() => void hunt.mutate()}>
            {() => null}
          </AsyncBlock>
        )}
      </Screen>
    );
  }

  const data = hunt.data;
  const crew = data.memberCount > 1;
  const siftThis = async () => {
    await sift.selectHunt({ id: data.id, title: data.title, denomination: data.denomination, series: data.series });
    router.push('/sift');
  };

  const sheet = <StrapSheetSection hunt={data} wide={isWide} />;
  const hits = <FindsSection hunt={data} wide={isWide} crew={crew} />;
  const side = (
    <>
      <DetailsBlock
        hunt={data}
        onSaved={(next) => {
          // Sift reads the series from the hunt it keeps on this device; keep that copy current too.
          if (sift.hunt?.id === next.id) void sift.selectHunt({ id: next.id, title: next.title, denomination: next.denomination, series: next.series });
        }}
      />
      <CrewBlock hunt={data} onLeft={() => router.replace('/hunts')} />
      <ManageBlock hunt={data} />
    </>
  );

  return (
    <Screen
      title={data.title}
      subtitle={caption(data.source, `$${data.denomination} notes`, formatDate(data.startedAt))}
      maxWidth={1320}
      actions={
        <>
          <Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={back} testID="back-to-hunts" />
          {data.status === 'open' ? <Button label="Sift this hunt" onPress={() => void siftThis()} testID="sift-this-hunt" /> : null}
          <Button kind="secondary" label="Tally" accessibilityLabel="Open the Tally" onPress={() => router.push('/tally')} />
        </>
      }
    >
      <View style={styles.badges}>
        <Badge label={data.status} tone={data.status === 'open' ? 'ok' : 'neutral'} accessibilityLabel={`Status: ${data.status}`} />
        <Badge label={data.role === 'owner' ? 'your hunt' : `crew of ${data.owner.displayName}`} tone="neutral" />
      </View>
      <StatRow>
        <Stat label="Notes searched" value={formatCount(data.notesSearched)} testID="stat-notes" />
        <Stat label="Finds" value={formatCount(data.hits)} tone={data.hits ? 'hit' : 'ink'} hint={data.notesSearched ? `${formatRate((data.hits * 1000) / data.notesSearched)} per 1,000` : undefined} />
        <Stat label="Pulled" value={formatCount(data.pulled)} />
        <Stat label="Straps" value={`${data.strapCount} of ${data.plannedStraps}`} hint="with notes logged" />
      </StatRow>
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.main}>
            {sheet}
            {hits}
          </View>
          <View style={styles.side}>{side}</View>
        </View>
      ) : (
        <>
          {sheet}
          {hits}
          {side}
        </>
      )}
      <ChanceBlock hunt={data} wide={isWide} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  badges: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap', marginTop: -space.sm },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0, gap: space.lg },
  side: { width: 340, gap: space.lg },
});
