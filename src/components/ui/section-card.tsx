import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

interface SectionCardProps {
  title: string;
  subtitle?: string;
  actions?: ReactNode;
  children: ReactNode;
  testID?: string;
}

/** One boxed part of a page (the hunt page, Tally) with its level-two heading, a line under it and actions beside it. */
export function SectionCard({ title, subtitle, children, actions, testID }: SectionCardProps) {
  const theme = useTheme();
  return (
    <View style={[styles.section, { borderColor: theme.line, backgroundColor: theme.surfaceRaised }]} testID={testID}>
      <View style={styles.head}>
        <View style={styles.titles}>
          <Text variant="heading" accessibilityRole="header" aria-level={2}>
            {title}
          </Text>
          {subtitle ? (
            <Text variant="caption" tone="muted">
              {subtitle}
            </Text>
          ) : null}
        </View>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  titles: { gap: space.xxs, flexShrink: 1 },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
