import { forwardRef } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { fontSize, radius, space, touch } from '../../theme/tokens';
import { Text } from './text';

export interface FieldProps extends TextInputProps {
  label: string;
  error?: string;
  hint?: string;
}

export const Field = forwardRef<TextInput, FieldProps>(function Field({ label, error, hint, style, ...input }, ref) {
  const theme = useTheme();
  return (
    <View style={styles.wrap}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-invalid={!!error}
        placeholderTextColor={theme.inkFaint}
        {...input}
        style={[
          styles.input,
          { color: theme.ink, backgroundColor: theme.surfaceRaised, borderColor: error ? theme.danger : theme.line },
          style,
        ]}
      />
      {error ? (
        <Text variant="caption" tone="danger" accessibilityRole="alert">
          {label} {error}
        </Text>
      ) : hint ? (
        <Text variant="caption" tone="faint">
          {hint}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  input: {
    minHeight: touch.minimum + 4,
    borderWidth: 1,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    fontSize: fontSize.md,
  },
});
