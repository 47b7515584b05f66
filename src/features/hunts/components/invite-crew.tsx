import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { createInviteRequest } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useTheme } from '@/theme/theme-provider';
import { space } from '@/theme/tokens';
import { sendInvite, useInvites, withdrawInvite } from '../api';
import { formatShortDate as formatDate } from '@/lib/format';


/** The owner invites crew by e-mail (no account needed yet) and sees who has not answered. */
export function InviteCrew({ huntId }: { huntId: string }) {
  const theme = useTheme();
  const invites = useInvites(huntId);
  const [email, setEmail] = useState('');
  const [emailError, setEmailError] = useState<string | undefined>();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const sending = useSubmit(async () => {
    const parsed = createInviteRequest.safeParse({ email: email.trim() });
    if (!parsed.success) {
      setEmailError(parsed.error.issues[0]?.message ?? 'is not an e-mail address');
      return;
    }
    const invite = await sendInvite(huntId, parsed.data);
    setSentTo(invite.email);
    setEmail('');
  });
  const withdrawing = useSubmit((inviteId: string) => withdrawInvite(huntId, inviteId));
  const pending = invites.data?.items ?? [];
  return (
    <View style={styles.wrap} testID="invite-crew">
      {sending.message ? <Notice tone="error">{sending.message}</Notice> : null}
      {sentTo ? <Notice tone="ok">{`Invitation sent to ${sentTo}. The link works once, for 14 days.`}</Notice> : null}
      <View style={styles.row}>
        <View style={styles.grow}>
          <Field
            label="Invite by e-mail"
            value={email}
            onChangeText={(text) => {
              setEmail(text);
              setEmailError(undefined);
              setSentTo(null);
            }}
            error={emailError ?? sending.fields.email}
            hint="For someone without an account yet: the mail's link lets them make one and join."
            autoCapitalize="none"
            keyboardType="email-address"
            testID="invite-email"
          />
        </View>
        <Button label="Send" kind="secondary" busy={sending.busy} onPress={() => void sending.submit()} style={styles.button} testID="invite-send" />
      </View>
      {pending.length ? (
        <View role="list" aria-label="Invitations not yet accepted">
          {pending.map((invite) => (
            <View key={invite.id} role="listitem" style={[styles.pending, { borderBottomColor: theme.line }]}>
              <View style={styles.grow}>
                <Text>{invite.email}</Text>
                <Text variant="caption" tone="muted">
                  invited {formatDate(invite.createdAt)} · open until {formatDate(invite.expiresAt)}
                </Text>
              </View>
              <Button
                compact
                kind="quiet"
                label="Withdraw"
                accessibilityLabel={`Withdraw the invitation to ${invite.email}`}
                busy={withdrawing.busy}
                onPress={() => void withdrawing.submit(invite.id)}
              />
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  grow: { flex: 1, minWidth: 0 },
  button: { marginTop: 22 },
  pending: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth },
});
