import { StyleSheet, View } from 'react-native';
import { KeypadKey } from '@/components/ui/keypad-key';
import { space } from '@/theme/tokens';

interface KeypadProps {
  onDigit(digit: string): void;
  onDelete(): void;
  onLog(): void;
  onToggleStar(): void;
  onTogglePulled(): void;
  star: boolean;
  pulled: boolean;
  canLog: boolean;
  canDelete: boolean;
  showShortcuts: boolean;
}

const ROWS = [
  ['1', '2', '3'],
  ['4', '5', '6'],
  ['7', '8', '9'],
];

/** Digits in the phone layout (1 at the top left), delete and zero under them, star and pull beside log. */
export function Keypad({ onDigit, onDelete, onLog, onToggleStar, onTogglePulled, star, pulled, canLog, canDelete, showShortcuts }: KeypadProps) {
  return (
    <View style={styles.pad} accessibilityLabel="Keypad" testID="keypad">
      {ROWS.map((row) => (
        <View key={row.join('')} style={styles.row}>
          {row.map((digit) => (
            <KeypadKey key={digit} label={digit} accessibilityLabel={`Digit ${digit}`} onPress={() => onDigit(digit)} testID={`key-${digit}`} />
          ))}
        </View>
      ))}
      <View style={styles.row}>
        <KeypadKey
          label="★"
          tone="toggle"
          active={star}
          accessibilityLabel={star ? 'Star note: on' : 'Star note: off'}
          onPress={onToggleStar}
          shortcut={showShortcuts ? 'S' : undefined}
          testID="key-star"
        />
        <KeypadKey label="0" accessibilityLabel="Digit 0" onPress={() => onDigit('0')} testID="key-0" />
        <KeypadKey
          label="⌫"
          tone="action"
          accessibilityLabel="Delete last digit"
          onPress={onDelete}
          disabled={!canDelete}
          shortcut={showShortcuts ? '⌫' : undefined}
          testID="key-delete"
        />
      </View>
      <View style={styles.row}>
        <KeypadKey
          label={pulled ? 'Pulled' : 'Pull'}
          tone="toggle"
          active={pulled}
          accessibilityLabel={pulled ? 'Pull this note: on' : 'Pull this note: off'}
          onPress={onTogglePulled}
          shortcut={showShortcuts ? 'P' : undefined}
          testID="key-pull"
        />
        <KeypadKey
          label="Log note"
          tone="primary"
          accessibilityLabel="Log note and start the next"
          onPress={onLog}
          disabled={!canLog}
          shortcut={showShortcuts ? '⏎' : undefined}
          style={styles.log}
          testID="key-log"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pad: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm },
  log: { flex: 2 },
});
