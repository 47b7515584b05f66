import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { copyText } from '@/lib/copy-text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';
import { createShareLink, revokeShareLink, useShareStatus } from '../api';
import { formatDate } from '@/lib/format';

const mediumDate = (iso: string) => formatDate(iso, 'medium');

/**
 * A read-only link to this one note for another collector. Only a hash of the link is kept, so its
 * address is shown once, when made; later the page says a link is out and offers a new one.
 */
export function ShareCard({ keeperId }: { keeperId: string }) {
  const theme = useTheme();
  const status = useShareStatus(keeperId);
  const [fresh, setFresh] = useState<string | null>(null);
  const [copied, setCopied] = useState<boolean | null>(null);
  const [withdrawing, setWithdrawing] = useState(false);
  const making = useSubmit(async () => {
    const link = await createShareLink(keeperId);
    setFresh(link.url ?? null);
    setCopied(null);
  });
  const revoking = useSubmit(async () => {
    await revokeShareLink(keeperId);
    setFresh(null);
    setWithdrawing(false);
  });
  const active = status.data?.active ?? null;
  return (
    <Card testID="share-card">
      <Text variant="label" tone="muted">
        SHARE LINK
      </Text>
      <Text tone="muted">
        A page for another collector with this note&apos;s serial, patterns, grade and one photo, small (the front if there is one) — never your name, values, notes or other keepers.
      </Text>
      {making.message ? <Notice tone="error">{making.message}</Notice> : null}
      {fresh && active ? (
        <View style={styles.block}>
          <Text variant="caption" tone="muted">
            Copy it now: for your safety Strapsift keeps only a fingerprint of it and cannot show it again.
          </Text>
          <Text selectable style={[styles.link, { borderColor: theme.line, backgroundColor: theme.surfaceSunken }]} testID="share-url">
            {fresh}
          </Text>
          <View style={styles.actions}>
            <Button
              compact
              label={copied ? 'Copied' : 'Copy link'}
              onPress={() => void copyText(fresh).then(setCopied)}
              testID="share-copy"
            />
            {copied === false ? (
              <Text variant="caption" tone="muted">
                Select the address and copy it by hand.
              </Text>
            ) : null}
          </View>
        </View>
      ) : active ? (
        <Text testID="share-active">A link is out since {mediumDate(active.createdAt)}.</Text>
      ) : status.data ? (
        <Text tone="muted">Not shared.</Text>
      ) : null}
      <View style={styles.actions}>
        <Button
          compact
          kind={active ? 'secondary' : 'primary'}
          label={active ? 'Make a new link' : 'Share this note'}
          accessibilityLabel={active ? 'Make a new share link; the old one stops working' : 'Share this note'}
          busy={making.busy}
          onPress={() => void making.submit()}
          testID="share-create"
        />
        {active ? <Button compact kind="danger" label="Withdraw link" onPress={() => setWithdrawing(true)} testID="share-revoke" /> : null}
      </View>
      <ConfirmDialog
        visible={withdrawing}
        title="Withdraw the share link?"
        message="Anyone who opens it afterwards finds nothing. You can make a new link later."
        confirmLabel="Withdraw link"
        danger
        busy={revoking.busy}
        error={revoking.message}
        onConfirm={() => void revoking.submit()}
        onCancel={() => setWithdrawing(false)}
        testID="share-confirm"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.sm },
  link: { fontFamily: fonts.mono, fontSize: 13, padding: space.sm, borderWidth: 1, borderRadius: radius.sm },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
});
