import { ActivityIndicator, Pressable, StyleSheet, type PressableProps, type StyleProp, type ViewStyle } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space, touch } from '../../theme/tokens';
import { Text } from './text';

type Kind = 'primary' | 'secondary' | 'quiet' | 'danger';

export interface ButtonProps extends Omit<PressableProps, 'style' | 'children'> {
  label: string;
  kind?: Kind;
  busy?: boolean;
  style?: StyleProp<ViewStyle>;
  /** One line, cut with an ellipsis: for a label that may be long (a hunt's title) in a row that must not overflow. */
  truncate?: boolean;
  compact?: boolean;
}

export function Button({ label, kind = 'primary', busy, disabled, style, compact, truncate, ...rest }: ButtonProps) {
  const theme = useTheme();
  const palette = {
    primary: { bg: theme.brand, fg: theme.onBrand, border: theme.brand },
    secondary: { bg: theme.surfaceRaised, fg: theme.ink, border: theme.line },
    quiet: { bg: 'transparent', fg: theme.brand, border: 'transparent' },
    danger: { bg: theme.surfaceRaised, fg: theme.danger, border: theme.danger },
  }[kind];
  const inactive = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={label}
      accessibilityState={{ disabled: !!inactive, busy: !!busy }}
      disabled={inactive}
      style={({ pressed, hovered, focused }: { pressed: boolean; hovered?: boolean; focused?: boolean }) => [
        styles.base,
        compact && styles.compact,
        { backgroundColor: palette.bg, borderColor: palette.border },
        (pressed || hovered) && !inactive && styles.pressed,
        focused && { outlineColor: theme.focus, outlineWidth: 2, outlineStyle: 'solid' } as ViewStyle,
        inactive && styles.inactive,
        style,
      ]}
      {...rest}
    >
      {busy ? <ActivityIndicator color={palette.fg} size="small" /> : null}
      <Text variant="label" style={{ color: palette.fg }} numberOfLines={truncate ? 1 : undefined}>
        {label}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: touch.minimum,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
  compact: { minHeight: 36, paddingHorizontal: space.md },
  pressed: { opacity: 0.85 },
  inactive: { opacity: 0.5 },
});
