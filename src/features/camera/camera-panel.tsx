import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { space } from '@/theme/tokens';
import type { CameraPanelProps } from './camera-panel-props';

/** The phone apps get the camera later (expo-camera); until then the keypad is the way in. */
export function CameraPanel({ onClose }: CameraPanelProps) {
  return (
    <View style={styles.wrap} testID="camera-problem">
      <Notice tone="info" title="Camera reading is in the web app for now">
        Open Strapsift in the phone’s browser to read serials with the camera, or use the keypad here.
      </Notice>
      <Button label="Back to the keypad" onPress={onClose} testID="camera-back" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.sm } });
