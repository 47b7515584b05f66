import type { FrameVerdict } from '@shared/ocr/acceptance';

export interface CameraPanelProps {
  /** Every frame's verdict, in order. */
  onVerdict(verdict: FrameVerdict): void;
  /** Back to the keypad. */
  onClose(): void;
  /** A line from Sift that replaces the camera's own hint (e.g. "already logged"). */
  status?: string | null;
}
