import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { addMemberRequest, type MemberView } from '@shared/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useTheme } from '@/theme/theme-provider';
import { space } from '@/theme/tokens';
import { formatCount } from '../../tally/format';

interface CrewListProps {
  members: readonly MemberView[];
  isOwner: boolean;
  currentUserId: string | null;
  onAdd(email: string): Promise<unknown>;
  onRemove(userId: string): Promise<unknown>;
  /** Called after the signed-in crew member has left, so the screen can go back to the list. */
  onLeft(): void;
}

/** Who sifts into this hunt and how many notes each logged; the owner adds and removes crew. */
export function CrewList({ members, isOwner, currentUserId, onAdd, onRemove, onLeft }: CrewListProps) {
  const theme = useTheme();
  const [email, setEmail] = useState('');
  const [emailError, setEmailError] = useState<string | undefined>();
  const [removing, setRemoving] = useState<MemberView | null>(null);

  const adding = useSubmit(async () => {
    const parsed = addMemberRequest.safeParse({ email: email.trim() });
    if (!parsed.success) {
      setEmailError(parsed.error.issues[0]?.message ?? 'is not an e-mail address');
      return;
    }
    await onAdd(parsed.data.email);
    setEmail('');
  });
  const removal = useSubmit(async (member: MemberView) => {
    await onRemove(member.userId);
    setRemoving(null);
    if (member.userId === currentUserId) onLeft();
  });

  const leaving = removing?.userId === currentUserId;
  return (
    <View style={styles.wrap} testID="crew-list">
      <View role="list" aria-label="Crew">
        {members.map((member) => {
          const isMe = member.userId === currentUserId;
          const canRemove = member.role === 'crew' && (isOwner || isMe);
          return (
            <View key={member.userId} role="listitem" style={[styles.row, { borderBottomColor: theme.line }]}>
              <View style={styles.who}>
                <Text bold>
                  {member.displayName}
                  {isMe ? ' (you)' : ''}
                </Text>
                <Text variant="caption" tone="muted">
                  {formatCount(member.notesLogged)} notes logged
                </Text>
              </View>
              <Badge label={member.role} tone={member.role === 'owner' ? 'ok' : 'neutral'} accessibilityLabel={`Role: ${member.role}`} />
              {canRemove ? (
                <Button
                  kind="quiet"
                  compact
                  label={isMe ? 'Leave' : 'Remove'}
                  accessibilityLabel={isMe ? 'Leave this hunt' : `Remove ${member.displayName} from the crew`}
                  onPress={() => setRemoving(member)}
                />
              ) : null}
            </View>
          );
        })}
      </View>
      {isOwner ? (
        <View style={styles.add}>
          {adding.message ? <Notice tone="error">{adding.message}</Notice> : null}
          <View style={styles.addRow}>
            <View style={styles.grow}>
              <Field
                label="Add crew by e-mail"
                value={email}
                onChangeText={(text) => {
                  setEmail(text);
                  setEmailError(undefined);
                }}
                error={emailError ?? adding.fields.email}
                hint="They need a Strapsift account; they then sift their own straps into this hunt."
                autoCapitalize="none"
                keyboardType="email-address"
                testID="crew-email"
              />
            </View>
            <Button label="Add" kind="secondary" busy={adding.busy} onPress={() => void adding.submit()} style={styles.addButton} testID="crew-add" />
          </View>
        </View>
      ) : null}
      <ConfirmDialog
        visible={removing !== null}
        title={leaving ? 'Leave this hunt?' : `Remove ${removing?.displayName ?? ''}?`}
        message={
          leaving
            ? 'The notes you logged stay in the hunt. The owner can add you again.'
            : 'They can no longer log notes into this hunt. The notes they already logged stay in it.'
        }
        confirmLabel={leaving ? 'Leave hunt' : 'Remove'}
        danger
        busy={removal.busy}
        error={removal.message}
        onConfirm={() => removing && void removal.submit(removing)}
        onCancel={() => {
          removal.setMessage(null);
          setRemoving(null);
        }}
        testID="crew-confirm"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth },
  who: { flex: 1, gap: 2 },
  add: { gap: space.sm },
  addRow: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  grow: { flex: 1 },
  addButton: { marginTop: 22 },
});
