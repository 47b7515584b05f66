import { Pressable, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space, touch } from '../../theme/tokens';
import { Text } from './text';

interface ChoiceRowProps<T extends string | number> {
  label: string;
  options: readonly { value: T; label: string }[];
  value: T;
  onChange(value: T): void;
  testID?: string;
}

/** A row of mutually exclusive pills (a radio group) for small fixed choices. */
export function ChoiceRow<T extends string | number>({ label, options, value, onChange, testID }: ChoiceRowProps<T>) {
  const theme = useTheme();
  return (
    <View style={styles.wrap} accessibilityRole="radiogroup" accessibilityLabel={label} testID={testID}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <View style={styles.row}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={String(option.value)}
              accessibilityRole="radio"
              accessibilityState={{ checked: selected }}
              // react-native-web ignores accessibilityState; the ARIA prop carries the choice on the web.
              aria-checked={selected}
              accessibilityLabel={`${label}: ${option.label}`}
              onPress={() => onChange(option.value)}
              style={[
                styles.pill,
                { borderColor: selected ? theme.brand : theme.line, backgroundColor: selected ? theme.brand : theme.surfaceRaised },
              ]}
            >
              <Text variant="label" style={{ color: selected ? theme.onBrand : theme.ink }}>
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  pill: { minHeight: touch.minimum, minWidth: touch.minimum, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, alignItems: 'center', justifyContent: 'center' },
});
