import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { GRADES, gradeBand } from '@shared/trade';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius, space, touch } from '@/theme/tokens';

/** The common points of the 1–70 scale as one-tap pills, and any whole grade typed in. */
export function GradePicker({ value, onChange, error }: { value: string; onChange(text: string): void; error?: string }) {
  const theme = useTheme();
  const numeric = Number(value);
  return (
    <View style={styles.wrap} accessibilityLabel="Grade on the 1–70 scale">
      <Text variant="label" tone="muted">
        Grade (1–70)
      </Text>
      <View style={styles.row}>
        {GRADES.map((grade) => {
          const selected = numeric === grade.grade;
          return (
            <Pressable
              key={grade.grade}
              role="radio"
              aria-checked={selected}
              accessibilityLabel={`Grade ${grade.label}`}
              onPress={() => onChange(String(grade.grade))}
              style={[styles.pill, { borderColor: selected ? theme.brand : theme.line, backgroundColor: selected ? theme.brand : theme.surfaceRaised }]}
            >
              <Text variant="caption" style={{ color: selected ? theme.onBrand : theme.ink, fontWeight: '600' }}>
                {grade.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      <View style={styles.row}>
        <TextInput
          accessibilityLabel="Grade number"
          value={value}
          onChangeText={(text) => onChange(text.replace(/[^0-9]/g, '').slice(0, 2))}
          inputMode="numeric"
          placeholder="e.g. 64"
          placeholderTextColor={theme.inkFaint}
          style={[styles.input, { color: theme.ink, borderColor: error ? theme.danger : theme.line, backgroundColor: theme.surfaceRaised }]}
          testID="grade-input"
        />
        <Text variant="caption" tone="faint" style={styles.hint} testID="grade-band">
          {gradeBand(numeric)
            ? `${gradeBand(numeric)!.name} (${gradeBand(numeric)!.from}–${gradeBand(numeric)!.to})`
            : 'Any whole number 1–70. Leave empty if ungraded.'}
        </Text>
      </View>
      {error ? (
        <Text variant="caption" tone="danger">
          Grade {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, alignItems: 'center' },
  pill: { minHeight: 36, paddingHorizontal: space.sm, borderWidth: 1, borderRadius: radius.sm, justifyContent: 'center' },
  input: { width: 80, minHeight: touch.minimum, borderWidth: 1, borderRadius: radius.sm, paddingHorizontal: space.sm, fontFamily: fonts.mono, fontSize: 16 },
  hint: { flex: 1 },
});
