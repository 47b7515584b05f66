import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { fonts, fontSize, radius, space } from '../../theme/tokens';
import { Text } from './text';

interface StatProps {
  label: string;
  value: string;
  hint?: string;
  tone?: 'ink' | 'hit' | 'ok' | 'warn';
  testID?: string;
}

/** One figure with its name, read as "Notes searched: 4,000" by a screen reader. */
export function Stat({ label, value, hint, tone = 'ink', testID }: StatProps) {
  const theme = useTheme();
  return (
    <View
      accessible
      accessibilityLabel={`${label}: ${value}${hint ? `, ${hint}` : ''}`}
      testID={testID}
      style={[styles.box, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }]}
    >
      <Text variant="caption" tone="muted" numberOfLines={1}>
        {label.toUpperCase()}
      </Text>
      <Text tone={tone} style={styles.value} numberOfLines={1}>
        {value}
      </Text>
      {hint ? (
        <Text variant="caption" tone="faint" numberOfLines={2}>
          {hint}
        </Text>
      ) : null}
    </View>
  );
}

/** Figures side by side that wrap to a second line on a phone. */
export function StatRow({ children }: { children: ReactNode }) {
  return <View style={styles.row}>{children}</View>;
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: radius.md, paddingVertical: space.sm, paddingHorizontal: space.md, gap: 2, flexGrow: 1, flexBasis: 140 },
  value: { fontFamily: fonts.monoMedium, fontSize: fontSize.lg, fontVariant: ['tabular-nums'] },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
