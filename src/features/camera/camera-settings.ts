import { useCallback, useEffect, useState } from 'react';
import { kv } from '@/lib/storage/kv';

/** The camera's switches, kept on the device (they are about this phone, not the account). */
export interface CameraSettings {
  /** Log the next different serial as soon as it is accepted; off: wait for a tap. */
  autoLog: boolean;
  /** A short tone when a find is logged. */
  sound: boolean;
  /** A short buzz when a find is logged, where the device can. */
  vibrate: boolean;
}

export const DEFAULT_CAMERA_SETTINGS: CameraSettings = { autoLog: true, sound: true, vibrate: true };
const KEY = 'strapsift.camera.settings';

export function useCameraSettings() {
  const [settings, setSettings] = useState<CameraSettings>(DEFAULT_CAMERA_SETTINGS);
  useEffect(() => {
    void kv.get<Partial<CameraSettings>>(KEY).then((saved) => {
      if (saved && typeof saved === 'object') setSettings({ ...DEFAULT_CAMERA_SETTINGS, ...saved });
    });
  }, []);
  const change = useCallback((patch: Partial<CameraSettings>) => {
    setSettings((current) => {
      const next = { ...current, ...patch };
      void kv.set(KEY, next);
      return next;
    });
  }, []);
  return { settings, change };
}
