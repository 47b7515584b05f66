import { StyleSheet, TextInput, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space } from '@/theme/tokens';

/** A labelled small number field for one weight; keeps whatever is typed and shows the contract's complaint. */
export function NumberCell({ label, value, onChange, error }: { label: string; value: string; onChange(text: string): void; error?: string }) {
  const theme = useTheme();
  return (
    <View style={styles.cell}>
      <Text variant="caption" tone="muted" numberOfLines={1}>
        {label}
      </Text>
      <TextInput
        accessibilityLabel={`Weight for ${label}`}
        aria-invalid={!!error}
        value={value}
        onChangeText={onChange}
        inputMode="decimal"
        keyboardType="numbers-and-punctuation"
        style={[styles.input, { color: theme.ink, borderColor: error ? theme.danger : theme.line, backgroundColor: theme.surfaceRaised }]}
      />
      {error ? (
        <Text variant="caption" tone="danger">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  cell: { width: 104, gap: 2 },
  input: { minHeight: 44, borderWidth: 1, borderRadius: radius.sm, paddingHorizontal: space.sm, fontFamily: fonts.mono, fontSize: 16 },
});
