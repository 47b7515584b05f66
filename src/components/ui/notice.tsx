import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

type Tone = 'info' | 'caution' | 'error' | 'ok';

/** A boxed message: errors from the server, cautions about money and the law, confirmations. */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children: string }) {
  const theme = useTheme();
  const color = { info: theme.near, caution: theme.warn, error: theme.danger, ok: theme.ok }[tone];
  return (
    <View
      // "note" is ARIA's role for an aside like this; an unnamed region would be an empty landmark.
      role={tone === 'error' ? 'alert' : 'note'}
      style={[styles.box, { borderLeftColor: color, backgroundColor: theme.surfaceSunken }]}
    >
      {title ? (
        <Text variant="label" style={{ color }}>
          {title}
        </Text>
      ) : null}
      <Text variant="body" tone="muted">
        {children}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, borderRadius: radius.sm, paddingVertical: space.md, paddingHorizontal: space.lg, gap: space.xs },
});
