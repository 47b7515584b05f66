import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { PageHeading } from '@/components/ui/page-heading';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { space } from '@/theme/tokens';

export function NotFoundScreen() {
  const theme = useTheme();
  return (
    <View role="main" style={[styles.root, { backgroundColor: theme.surface }]}>
      <Text variant="digits" tone="faint">
        00000000
      </Text>
      <PageHeading>No such page</PageHeading>
      <Text tone="muted">Like serial 00000000, this page was never printed.</Text>
      <Link href="/sift" style={{ color: theme.brand, fontWeight: '600' }}>
        Back to Sift
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, padding: space.xl },
});
