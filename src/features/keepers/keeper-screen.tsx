import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { router, useLocalSearchParams } from 'expo-router';
import { gradeLabel } from '@shared/trade';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { formatCents } from '@/lib/money';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { deleteKeeper, updateKeeper, useKeeper } from './api';
import { keeperTitle } from './components/keeper-card';
import { KeeperForm } from './components/keeper-form';
import { KeeperPhotos } from './components/keeper-photos';
import { KeeperReading } from './components/keeper-reading';
import { ShareCard } from './components/share-card';
import { checkKeeperDraft, emptyKeeperDraft, keeperToDraft, type KeeperDraft } from './keeper-draft';

export function KeeperScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { isWide } = useLayout();
  const { data: keeper, error, isLoading } = useKeeper(typeof id === 'string' ? id : null);
  const [draft, setDraft] = useState<KeeperDraft>(emptyKeeperDraft);
  const [checkFields, setCheckFields] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);

  useEffect(() => {
    if (keeper) setDraft(keeperToDraft(keeper));
  }, [keeper?.id, keeper?.updatedAt]); // eslint-disable-line react-hooks/exhaustive-deps

  const save = useSubmit(async () => {
    if (!keeper) return;
    const checked = checkKeeperDraft(draft);
    if (!checked.ok) {
      setCheckFields(checked.fields);
      return;
    }
    setCheckFields({});
    await updateKeeper(keeper.id, checked.body);
    setSaved(true);
  });
  const remove = useSubmit(async () => {
    if (!keeper) return;
    await deleteKeeper(keeper.id);
    router.replace('/keepers');
  });

  if (isLoading) {
    return (
      <Screen title="Keeper">
        <Text tone="muted">Loading…</Text>
      </Screen>
    );
  }
  if (error || !keeper) {
    return (
      <Screen title="Keeper">
        <Notice tone="error">This keeper could not be found. It may have been deleted.</Notice>
        <Button kind="secondary" label="Back to keepers" onPress={() => router.replace('/keepers')} />
      </Screen>
    );
  }

  const form = (
    <Card>
      <KeeperForm draft={draft} onChange={(next) => { setDraft(next); setSaved(false); }} fields={{ ...save.fields, ...checkFields }} />
      {save.message ? <Notice tone="error">{save.message}</Notice> : null}
      {saved ? <Notice tone="ok">Saved.</Notice> : null}
      <View style={styles.actions}>
        <Button label="Save keeper" busy={save.busy} onPress={() => void save.submit()} testID="save-keeper" />
        <Button kind="secondary" label="Undo changes" onPress={() => setDraft(keeperToDraft(keeper))} />
      </View>
    </Card>
  );

  const readingCard = (
    <Card>
      <Text variant="label" tone="muted">
        READING
      </Text>
      <KeeperReading reading={keeper.reading} />
    </Card>
  );

  const photos = <KeeperPhotos keeperId={keeper.id} photos={keeper.photos} />;
  const side = (
    <>
      {isWide ? photos : null}
      <ShareCard keeperId={keeper.id} />
      <Card>
        <Text variant="label" tone="muted">
          DELETE
        </Text>
        {confirmDelete ? (
          <>
            <Text>Delete {keeperTitle(keeper)} from your keepers? The logged note stays in its hunt.</Text>
            <View style={styles.actions}>
              <Button kind="danger" label="Yes, delete it" busy={remove.busy} onPress={() => void remove.submit()} testID="confirm-delete-keeper" />
              <Button kind="secondary" label="Keep it" onPress={() => setConfirmDelete(false)} />
            </View>
          </>
        ) : (
          <Button kind="danger" label="Delete keeper" onPress={() => setConfirmDelete(true)} />
        )}
      </Card>
    </>
  );

  return (
    <Screen
      title={keeperTitle(keeper)}
      subtitle={`${keeper.points} points · ${keeper.grade ? gradeLabel(keeper.grade) : 'ungraded'}${keeper.originalPaper === true ? ' · original paper' : keeper.originalPaper === false ? ' · not original paper' : ''} · ${formatCents(keeper.estimatedValueCents)} · found ${new Date(keeper.foundAt).toLocaleDateString('en-US')}`}
      actions={<Button compact kind="secondary" label="All keepers" onPress={() => router.push('/keepers')} />}
      maxWidth={1200}
    >
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.main}>{form}</View>
          <View style={styles.side}>
            {readingCard}
            {side}
          </View>
        </View>
      ) : (
        <>
          {readingCard}
          {photos}
          {form}
          {side}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 3 },
  side: { flex: 2, gap: space.lg },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
