import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';

/** One boxed part of the hunt page with its level-two heading and optional actions. */
export function HuntSection({ title, children, actions, testID }: { title: string; children: ReactNode; actions?: ReactNode; testID?: string }) {
  const theme = useTheme();
  return (
    <View style={[styles.section, { borderColor: theme.line, backgroundColor: theme.surfaceRaised }]} testID={testID}>
      <View style={styles.head}>
        <Text variant="heading" accessibilityRole="header" aria-level={2}>
          {title}
        </Text>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
