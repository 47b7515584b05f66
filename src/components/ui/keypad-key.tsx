import { Pressable, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { fonts, radius, touch } from '../../theme/tokens';
import { Text } from './text';

type Tone = 'digit' | 'action' | 'primary' | 'toggle';

interface KeypadKeyProps {
  label: string;
  accessibilityLabel: string;
  onPress(): void;
  tone?: Tone;
  active?: boolean;
  disabled?: boolean;
  /** The hardware key that does the same, shown small in a corner on wide screens. */
  shortcut?: string;
  style?: StyleProp<ViewStyle>;
  testID?: string;
}

/** A key a thumb can find without looking: at least 56 px, big digits, a firm pressed state. */
export function KeypadKey({ label, accessibilityLabel, onPress, tone = 'digit', active, disabled, shortcut, style, testID }: KeypadKeyProps) {
  const theme = useTheme();
  const background =
    tone === 'primary' ? theme.brand : active ? theme.hit : tone === 'digit' ? theme.surfaceRaised : theme.surfaceSunken;
  const foreground = tone === 'primary' ? theme.onBrand : active ? theme.onHit : theme.ink;
  // The desk-keyboard hint sits beside the button, not inside it: a button's name should start with
  // what it shows, and a stray "P" inside "Pull" would not (the line under the keypad lists the keys).
  return (
    <View style={[styles.slot, style]}>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={accessibilityLabel}
        accessibilityState={{ disabled: !!disabled }}
        // A toggle key is a pressed/not-pressed button, as a screen reader expects a star or pull switch to be.
        aria-pressed={tone === 'toggle' ? !!active : undefined}
        disabled={disabled}
        onPress={onPress}
        testID={testID}
        // Keys must not steal focus from the page, or the hardware keyboard would type into them.
        focusable={false}
        style={({ pressed }) => [
          styles.key,
          { backgroundColor: background, borderColor: theme.line },
          pressed && { backgroundColor: tone === 'primary' ? theme.ink : theme.line },
          disabled && styles.disabled,
        ]}
      >
        <Text style={[tone === 'digit' ? styles.digit : styles.word, { color: foreground }]}>{label}</Text>
      </Pressable>
      {shortcut ? (
        <View style={styles.shortcut} pointerEvents="none" aria-hidden>
          <Text variant="caption" style={{ color: tone === 'primary' ? theme.onBrand : theme.inkFaint, fontFamily: fonts.mono, opacity: disabled ? 0.45 : 1 }}>
            {shortcut}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  slot: { flex: 1, minWidth: 56, position: 'relative' },
  key: {
    minHeight: touch.key - 4,
    flex: 1,
    borderRadius: radius.md,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
    position: 'relative',
  },
  digit: { fontFamily: fonts.monoMedium, fontSize: 28 },
  word: { fontSize: 16, fontWeight: '700' },
  shortcut: { position: 'absolute', right: 8, top: 4 },
  disabled: { opacity: 0.45 },
});
