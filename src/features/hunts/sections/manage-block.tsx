import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { HuntDetail } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { SectionCard } from '@/components/ui/section-card';
import { useSubmit } from '@/lib/api/use-submit';
import { formatCount, formatDate } from '@/lib/format';
import { space } from '@/theme/tokens';
import { closeHunt, deleteHunt, mailSummary } from '../api';

/** Close, delete or mail the summary (the owner); a line saying whose hunt it is (crew). */
export function ManageBlock({ hunt }: { hunt: HuntDetail }) {
  const [asking, setAsking] = useState<'close' | 'delete' | null>(null);
  const closing = useSubmit(async () => {
    await closeHunt(hunt.id);
    setAsking(null);
  });
  const deleting = useSubmit(async () => {
    await deleteHunt(hunt.id);
    setAsking(null);
    router.replace('/hunts');
  });
  const [mailedTo, setMailedTo] = useState<string | null>(null);
  const mailing = useSubmit(async () => {
    setMailedTo((await mailSummary(hunt.id)).to);
  });
  if (hunt.role !== 'owner') {
    return (
      <SectionCard title="This hunt" testID="manage-section">
        <Text tone="muted">
          You are crew in {hunt.owner.displayName}&apos;s hunt: you log notes and square your straps; closing and deleting are theirs.
        </Text>
      </SectionCard>
    );
  }
  const current = asking === 'close' ? closing : deleting;
  return (
    <SectionCard title="This hunt" testID="manage-section">
      <Text tone="muted">
        {hunt.status === 'open'
          ? 'Close the hunt when the straps have gone back: no more notes can be logged into it, and its figures stay.'
          : `Closed ${hunt.closedAt ? formatDate(hunt.closedAt) : ''}. Its figures stay in your tally.`}
      </Text>
      {mailing.message ? <Notice tone="error">{mailing.message}</Notice> : null}
      {mailedTo ? <Notice tone="ok">{`The summary is on its way to ${mailedTo}.`}</Notice> : null}
      <View style={styles.manageActions}>
        {hunt.status === 'open' ? (
          <Button kind="secondary" label="Close hunt" onPress={() => setAsking('close')} testID="close-hunt" />
        ) : (
          <Button kind="secondary" label="E-mail me the summary" busy={mailing.busy} onPress={() => void mailing.submit()} testID="mail-summary" />
        )}
        <Button kind="danger" label="Delete hunt" onPress={() => setAsking('delete')} testID="delete-hunt" />
      </View>
      <ConfirmDialog
        visible={asking !== null}
        title={asking === 'close' ? `Close ${hunt.title}?` : `Delete ${hunt.title}?`}
        message={
          asking === 'close'
            ? 'Nobody can log notes into it after this, crew included. The strap sheet, finds and tally stay, and you can e-mail yourself its summary.'
            : `This removes the hunt, its strap sheet and all ${formatCount(hunt.notesSearched)} notes logged in it, for the whole crew. It cannot be undone.`
        }
        confirmLabel={asking === 'close' ? 'Close hunt' : 'Delete for good'}
        danger={asking === 'delete'}
        busy={current.busy}
        error={current.message}
        onConfirm={() => void current.submit()}
        onCancel={() => {
          closing.setMessage(null);
          deleting.setMessage(null);
          setAsking(null);
        }}
        testID="hunt-confirm"
      />
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  manageActions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
