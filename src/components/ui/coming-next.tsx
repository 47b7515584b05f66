import { StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Text } from './text';

/** An honest placeholder: says what the page will do, instead of pretending to do it. */
export function ComingNext({ what, points }: { what: string; points: string[] }) {
  const theme = useTheme();
  return (
    <View style={[styles.box, { borderColor: theme.line, backgroundColor: theme.surfaceSunken }]} accessibilityRole="summary">
      <Text variant="label" tone="muted">
        COMING NEXT
      </Text>
      <Text variant="heading">{what}</Text>
      {points.map((point) => (
        <Text key={point} tone="muted">
          · {point}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderStyle: 'dashed', borderRadius: radius.lg, padding: space.xl, gap: space.sm },
});
