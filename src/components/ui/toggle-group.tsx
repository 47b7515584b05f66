import { Pressable, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space, touch } from '../../theme/tokens';
import { Text } from './text';

interface ToggleGroupProps<T extends string> {
  label: string;
  options: readonly { value: T; label: string }[];
  selected: readonly T[];
  onToggle(value: T): void;
  testID?: string;
}

/** Pills that each switch on and off (checkboxes), for picking several of a few fixed choices. */
export function ToggleGroup<T extends string>({ label, options, selected, onToggle, testID }: ToggleGroupProps<T>) {
  const theme = useTheme();
  return (
    <View style={styles.wrap} role="group" aria-label={label} testID={testID}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <View style={styles.row}>
        {options.map((option) => {
          const on = selected.includes(option.value);
          return (
            <Pressable
              key={option.value}
              role="checkbox"
              aria-checked={on}
              accessibilityLabel={`${label}: ${option.label}`}
              onPress={() => onToggle(option.value)}
              style={[
                styles.pill,
                { borderColor: on ? theme.brand : theme.line, backgroundColor: on ? theme.brand : theme.surfaceRaised },
              ]}
            >
              <Text variant="label" style={{ color: on ? theme.onBrand : theme.inkMuted }}>
                {on ? '✓ ' : ''}
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
  pill: { minHeight: touch.minimum, paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 1, alignItems: 'center', justifyContent: 'center' },
});
