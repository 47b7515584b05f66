import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Redirect } from 'expo-router';
import type { AdminStats } from '@shared/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useSession } from '@/lib/session/session-provider';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { fonts, space } from '@/theme/tokens';
import { setUserDisabled, useAdminStats, useAdminUsers } from './api';
import { formatCount } from '@/lib/format';

const TOTALS: { key: keyof AdminStats; label: string }[] = [
  { key: 'users', label: 'Accounts' },
  { key: 'disabledUsers', label: 'Disabled' },
  { key: 'newUsersLast7Days', label: 'New this week' },
  { key: 'hunts', label: 'Hunts' },
  { key: 'openHunts', label: 'Open hunts' },
  { key: 'scans', label: 'Notes logged' },
  { key: 'scansLast7Days', label: 'Notes this week' },
  { key: 'keepers', label: 'Keepers' },
];

/** Accounts and totals for admins; collectors never see this page. */
export function ConsoleScreen() {
  const { user } = useSession();
  const theme = useTheme();
  const { isWide } = useLayout();
  const [query, setQuery] = useState('');
  const users = useAdminUsers(query.trim());
  const stats = useAdminStats();
  const toggle = useSubmit(async (id: string, disabled: boolean) => setUserDisabled(id, disabled));

  if (user?.role !== 'admin') return <Redirect href="/you" />;

  return (
    <Screen title="Console" subtitle="Accounts and system totals. Admins only.">
      <View style={styles.totals}>
        {TOTALS.map((total) => (
          <Card key={total.key} style={styles.total} testID={`console-total-${total.key}`}>
            <Text variant="caption" tone="muted">
              {total.label}
            </Text>
            <Text style={styles.totalNumber}>{stats.data ? formatCount(stats.data[total.key]) : '…'}</Text>
          </Card>
        ))}
      </View>
      <Card>
        <Field label="Find an account" value={query} onChangeText={setQuery} placeholder="part of an e-mail or name" autoCapitalize="none" testID="console-search" />
        {toggle.message ? <Notice tone="error">{toggle.message}</Notice> : null}
        {users.error ? <Notice tone="error">Accounts could not be loaded.</Notice> : null}
        {(users.data?.items ?? []).map((account) => (
          <View key={account.id} style={[styles.user, { borderTopColor: theme.line }, !isWide && styles.userStacked]} testID={`console-user-${account.email}`}>
            <View style={styles.userText}>
              <Text bold>{account.displayName}</Text>
              <Text variant="caption" tone="muted">
                {account.email} · {account.hunts} hunts · {formatCount(account.scans)} notes · {account.keepers} keepers
              </Text>
            </View>
            <View style={styles.userActions}>
              {account.role === 'admin' ? <Badge label="admin" /> : null}
              {account.disabled ? <Badge label="disabled" tone="near" /> : <Badge label="active" tone="ok" />}
              {account.id !== user.id ? (
                <Button
                  compact
                  kind={account.disabled ? 'secondary' : 'danger'}
                  label={account.disabled ? 'Enable' : 'Disable'}
                  accessibilityLabel={`${account.disabled ? 'Enable' : 'Disable'} ${account.email}`}
                  onPress={() => void toggle.submit(account.id, !account.disabled)}
                />
              ) : null}
            </View>
          </View>
        ))}
        {users.data && users.data.items.length === 0 ? <Text tone="muted">No account matches.</Text> : null}
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  totals: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  total: { minWidth: 150, flexGrow: 1, flexBasis: 150 },
  totalNumber: { fontFamily: fonts.monoMedium, fontSize: 24 },
  user: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderTopWidth: 1, paddingVertical: space.md },
  userStacked: { flexDirection: 'column', alignItems: 'flex-start' },
  userText: { flex: 1, gap: 2 },
  userActions: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
