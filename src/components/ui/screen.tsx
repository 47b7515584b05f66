import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { useLayout } from '../../theme/use-layout';
import { space } from '../../theme/tokens';
import { PageHeading } from './page-heading';
import { Text } from './text';

interface ScreenProps {
  title: string;
  subtitle?: string;
  actions?: ReactNode;
  children: ReactNode;
  /** Screens with their own scrolling (the keypad) opt out of the page scroll. */
  scroll?: boolean;
  maxWidth?: number;
}

/** The frame of every signed-in page: a heading row and a readable column on wide screens. */
export function Screen({ title, subtitle, actions, children, scroll = true, maxWidth = 1100 }: ScreenProps) {
  const theme = useTheme();
  const { isWide } = useLayout();
  const body = (
    <View style={[styles.column, { maxWidth, paddingHorizontal: isWide ? space.xxl : space.lg }]}>
      <View style={styles.header}>
        <View style={styles.headerText}>
          <PageHeading>{title}</PageHeading>
          {subtitle ? <Text tone="muted">{subtitle}</Text> : null}
        </View>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
  return (
    <View role="main" style={[styles.root, { backgroundColor: theme.surface }]}>
      {scroll ? <ScrollView contentContainerStyle={styles.scroll}>{body}</ScrollView> : body}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  scroll: { flexGrow: 1, paddingBottom: space.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: space.lg, paddingTop: space.xl, flexGrow: 1 },
  header: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  headerText: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
