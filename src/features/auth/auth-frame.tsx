import type { ReactNode } from 'react';
import { KeyboardAvoidingView, ScrollView, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { PageHeading } from '@/components/ui/page-heading';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, fontSize, radius, space } from '@/theme/tokens';

/** The signed-out pages share one calm card with the name and the job in a line. */
export function AuthFrame({ title, children, footer }: { title: string; children: ReactNode; footer?: { text: string; href: string; link: string }[] }) {
  const theme = useTheme();
  return (
    <KeyboardAvoidingView role="main" style={[styles.root, { backgroundColor: theme.surface }]} behavior="padding">
      <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">
        <View style={styles.column}>
          <View style={styles.brand}>
            <View style={[styles.mark, { backgroundColor: theme.brand }]}>
              <Text style={[styles.markText, { color: theme.onBrand }]}>S</Text>
            </View>
            <View>
              <Text variant="title">Strapsift</Text>
              <Text tone="muted">Sift every strap. Keep what matters.</Text>
            </View>
          </View>
          <View style={[styles.card, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }]}>
            <PageHeading style={styles.cardTitle}>{title}</PageHeading>
            {children}
          </View>
          {footer?.map((item) => (
            <Text key={item.href} tone="muted" style={styles.footer}>
              {item.text}{' '}
              <Link href={item.href} style={{ color: theme.brand, fontWeight: '600' }}>
                {item.link}
              </Link>
            </Text>
          ))}
        </View>
      </ScrollView>
    </KeyboardAvoidingView>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  scroll: { flexGrow: 1, justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: 420, alignSelf: 'center', gap: space.lg },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  mark: { width: 48, height: 48, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center' },
  markText: { fontFamily: fonts.monoBold, fontSize: 26 },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.xl, gap: space.lg },
  footer: { textAlign: 'center' },
  cardTitle: { fontSize: fontSize.lg, fontWeight: '600', letterSpacing: 0 },
});
