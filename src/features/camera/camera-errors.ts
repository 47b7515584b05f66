/** Why the camera could not start, each with words a hunter can act on. */
export type CameraProblem = 'insecure' | 'unsupported' | 'denied' | 'no-camera' | 'busy' | 'reader-failed';

export const CAMERA_PROBLEMS: Record<CameraProblem, { title: string; text: string }> = {
  insecure: {
    title: 'The camera needs a secure address',
    text: 'Browsers only lend the camera to pages opened over https (or on this device itself). Open Strapsift at its https address, or keep using the keypad.',
  },
  unsupported: {
    title: 'This browser has no camera access',
    text: 'Try a current browser on your phone, or keep using the keypad.',
  },
  denied: {
    title: 'Camera permission was refused',
    text: 'Allow the camera for this site in the browser settings (the lock or site icon by the address), then try again. The keypad works meanwhile.',
  },
  'no-camera': {
    title: 'No camera found',
    text: 'This device shows no camera. Use the keypad, or open Strapsift on your phone.',
  },
  busy: {
    title: 'The camera is in use',
    text: 'Another app or tab is using the camera. Close it and try again, or use the keypad.',
  },
  'reader-failed': {
    title: 'The reader could not start',
    text: 'The recogniser did not load (it is downloaded once, then kept for offline use). Check the connection and try again, or use the keypad.',
  },
};

/** Maps getUserMedia's errors (DOMException names) to our problems. */
export function problemFromError(error: unknown): CameraProblem {
  const name = error && typeof error === 'object' && 'name' in error ? String((error as { name: unknown }).name) : '';
  if (name === 'NotAllowedError' || name === 'SecurityError') return 'denied';
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'no-camera';
  if (name === 'NotReadableError' || name === 'AbortError') return 'busy';
  return 'unsupported';
}
