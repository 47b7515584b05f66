import { StyleSheet, View, type ViewProps } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';

export function Card({ style, ...rest }: ViewProps) {
  const theme = useTheme();
  return <View {...rest} style={[styles.card, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }, style]} />;
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
});
