import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

/** A bar that fills as work is done, with a line saying how far along it is; read out as a progress bar. */
export function ProgressBar({ done, total, label, testID }: { done: number; total: number; label: string; testID?: string }) {
  const theme = useTheme();
  const share = Math.max(0, Math.min(1, done / Math.max(1, total)));
  return (
    <View style={styles.box} accessibilityRole="progressbar" aria-valuenow={Math.round(share * 100)} aria-valuemin={0} aria-valuemax={100} aria-label={label} testID={testID}>
      <View style={[styles.track, { backgroundColor: theme.surfaceSunken, borderColor: theme.line }]}>
        <View style={[styles.fill, { backgroundColor: theme.brand, width: `${share * 100}%` }]} />
      </View>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  track: { height: 10, borderRadius: radius.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%' },
});
