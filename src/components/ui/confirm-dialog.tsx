import { Modal, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { radius, space } from '../../theme/tokens';
import { Button } from './button';
import { Notice } from './notice';
import { Text } from './text';

interface ConfirmDialogProps {
  visible: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  /** Deleting is red; closing or removing something that can be redone is not. */
  danger?: boolean;
  busy?: boolean;
  error?: string | null;
  onConfirm(): void;
  onCancel(): void;
  testID?: string;
}

/** Asks once before anything that can't be undone from the same screen. Cancel is the easy way out. */
export function ConfirmDialog({ visible, title, message, confirmLabel, danger, busy, error, onConfirm, onCancel, testID }: ConfirmDialogProps) {
  const theme = useTheme();
  return (
    <Modal visible={visible} transparent animationType="fade" onRequestClose={onCancel}>
      <View style={[styles.backdrop, { backgroundColor: 'rgba(0,0,0,0.45)' }]}>
        <View
          role="alertdialog"
          aria-modal
          aria-label={title}
          testID={testID}
          style={[styles.panel, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }]}
        >
          <Text variant="heading" accessibilityRole="header">
            {title}
          </Text>
          <Text tone="muted">{message}</Text>
          {error ? <Notice tone="error">{error}</Notice> : null}
          <View style={styles.actions}>
            <Button kind="secondary" label="Cancel" onPress={onCancel} disabled={busy} testID={testID ? `${testID}-cancel` : undefined} />
            <Button
              kind={danger ? 'danger' : 'primary'}
              label={confirmLabel}
              busy={busy}
              onPress={onConfirm}
              testID={testID ? `${testID}-confirm` : undefined}
            />
          </View>
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  panel: { width: '100%', maxWidth: 440, borderWidth: 1, borderRadius: radius.lg, padding: space.xl, gap: space.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm, flexWrap: 'wrap' },
});
