import * as Haptics from 'expo-haptics';

/** On a phone app the find is felt; sound waits for the native camera mode. */
export function announceFind(options: { sound: boolean; vibrate: boolean }): void {
  if (options.vibrate) void Haptics.notificationAsync(Haptics.NotificationFeedbackType.Success).catch(() => undefined);
}
