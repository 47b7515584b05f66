import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { ToggleGroup } from '@/components/ui/toggle-group';
import { type CameraSettings, useCameraSettings } from './camera-settings';

type Switch = keyof CameraSettings;
const SWITCHES: { value: Switch; label: string }[] = [
  { value: 'autoLog', label: 'Log each new serial by itself' },
  { value: 'sound', label: 'Sound on a find' },
  { value: 'vibrate', label: 'Vibrate on a find' },
];

/** The camera's switches on You; they live on this device. */
export function CameraSettingsCard() {
  const { settings, change } = useCameraSettings();
  const selected = SWITCHES.filter((item) => settings[item.value]).map((item) => item.value);
  return (
    <Card>
      <Text variant="label" tone="muted">
        CAMERA ON SIFT
      </Text>
      <ToggleGroup label="Camera" options={SWITCHES} selected={selected} onToggle={(value) => change({ [value]: !settings[value] })} testID="camera-settings" />
      <Text variant="caption" tone="faint">
        With the first switch off, the camera fills the cells and waits for a tap on Log. Serials the camera is unsure of always wait.
      </Text>
    </Card>
  );
}
