import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

type Tone = 'hit' | 'near' | 'neutral' | 'ok' | 'warn' | 'danger';

/** A pill naming a pattern or a state; the accessible label reads the same as the text. */
export function Badge({ label, tone = 'neutral', accessibilityLabel }: { label: string; tone?: Tone; accessibilityLabel?: string }) {
  const theme = useTheme();
  const colours = {
    hit: { bg: theme.hit, fg: theme.onHit, border: theme.hit },
    near: { bg: theme.nearSoft, fg: theme.near, border: theme.near },
    neutral: { bg: theme.surfaceSunken, fg: theme.inkMuted, border: theme.line },
    ok: { bg: theme.surfaceSunken, fg: theme.ok, border: theme.ok },
    warn: { bg: theme.surfaceSunken, fg: theme.warn, border: theme.warn },
    danger: { bg: theme.surfaceSunken, fg: theme.danger, border: theme.danger },
  }[tone];
  return (
    <View
      accessibilityRole="text"
      accessibilityLabel={accessibilityLabel ?? label}
      style={[styles.badge, { backgroundColor: colours.bg, borderColor: colours.border }]}
    >
      <Text variant="label" style={{ color: colours.fg }}>
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 3, alignSelf: 'flex-start' },
});
