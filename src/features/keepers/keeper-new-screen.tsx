import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { useSubmit } from '@/lib/api/use-submit';
import { space } from '@/theme/tokens';
import { createKeeper } from './api';
import { KeeperForm } from './components/keeper-form';
import { checkKeeperDraft, emptyKeeperDraft, type KeeperDraft } from './keeper-draft';

/** A note found outside a logged hunt (or before Strapsift), typed in by hand. */
export function KeeperNewScreen() {
  const [draft, setDraft] = useState<KeeperDraft>(emptyKeeperDraft);
  const [checkFields, setCheckFields] = useState<Record<string, string>>({});
  const save = useSubmit(async () => {
    const checked = checkKeeperDraft(draft);
    if (!checked.ok) {
      setCheckFields(checked.fields);
      return;
    }
    setCheckFields({});
    const keeper = await createKeeper(checked.body);
    router.replace(`/keepers/${keeper.id}`);
  });
  return (
    <Screen title="Add a keeper" subtitle="A note you already own, typed in by hand." maxWidth={760}>
      <Card>
        <KeeperForm draft={draft} onChange={setDraft} fields={{ ...save.fields, ...checkFields }} />
        {save.message ? <Notice tone="error">{save.message}</Notice> : null}
        <View style={styles.actions}>
          <Button label="Add to keepers" busy={save.busy} onPress={() => void save.submit()} testID="create-keeper" />
          <Button kind="secondary" label="Cancel" onPress={() => router.back()} />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
