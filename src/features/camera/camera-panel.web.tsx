import { useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { acceptFrame, type FrameVerdict, initialAcceptance } from '@shared/ocr/acceptance';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';
import { BAND } from './band';
import { CAMERA_PROBLEMS, type CameraProblem, problemFromError } from './camera-errors';
import type { CameraPanelProps } from './camera-panel-props';
import { type CameraReader, openCameraReader } from './camera-reader.web';
import { cameraVariants, PRIVACY_NOTE } from './camera-text';

type TorchTrack = Omit<MediaStreamTrack, 'getCapabilities'> & { getCapabilities?: () => { torch?: boolean } };

/**
 * The live rear camera with the framing band. Frames are read one after another in the recogniser's
 * worker; each result passes the acceptance rule and the verdict goes to Sift, which logs or asks.
 */
export function CameraPanel({ onVerdict, onClose, status }: CameraPanelProps) {
  const theme = useTheme();
  const videoRef = useRef<HTMLVideoElement | null>(null);
  const [problem, setProblem] = useState<CameraProblem | null>(null);
  const [progress, setProgress] = useState<{ share: number; label: string } | null>({ share: 0, label: 'Starting the camera' });
  const [torch, setTorch] = useState<{ track: TorchTrack; on: boolean } | null>(null);
  const [hint, setHint] = useState('Hold the serial line inside the band.');
  // The view takes the camera's own shape, so the band drawn over it is the band that is read.
  const [aspect, setAspect] = useState(16 / 9);
  const verdictRef = useRef(onVerdict);
  verdictRef.current = onVerdict;

  useEffect(() => {
    let stopped = false;
    let stream: MediaStream | null = null;

    async function start() {
      if (!window.isSecureContext) return setProblem('insecure');
      if (!navigator.mediaDevices?.getUserMedia) return setProblem('unsupported');
      try {
        stream = await navigator.mediaDevices.getUserMedia({
          video: { facingMode: { ideal: 'environment' }, width: { ideal: 1280 }, height: { ideal: 720 } },
          audio: false,
        });
      } catch (error) {
        if (!stopped) setProblem(problemFromError(error));
        return;
      }
      if (stopped) return stream.getTracks().forEach((track) => track.stop());
      // The reader (about 7 MB the first time) downloads only once the camera is granted.
      const readerReady = openCameraReader((share, label) => !stopped && setProgress({ share, label }));
      const video = videoRef.current;
      if (!video) return;
      video.srcObject = stream;
      await video.play().catch(() => undefined);
      if (video.videoWidth && video.videoHeight) setAspect(video.videoWidth / video.videoHeight);
      const track = stream.getVideoTracks()[0] as TorchTrack | undefined;
      if (track?.getCapabilities?.().torch) setTorch({ track, on: false });

      let reader: CameraReader;
      try {
        reader = await readerReady;
      } catch {
        if (!stopped) setProblem('reader-failed');
        return;
      }
      if (stopped) return;
      setProgress(null);
      let acceptance = initialAcceptance;
      for (let frame = 0; !stopped; frame++) {
        await nextVideoFrame(video);
        if (stopped) break;
        // The band is cropped off the video by the browser and read in the worker; the page only waits.
        const result = await reader.read(video, cameraVariants(frame).map((variant) => variant.name));
        if (!result) continue;
        // Named timings let the browser test (and the Performance panel) see what one frame costs in the worker.
        const end = performance.now();
        performance.measure('camera-frame', { start: end - result.ms, end });
        if (stopped) break;
        const next = acceptFrame(acceptance, result.read);
        acceptance = next.state;
        // What each frame read and what the rule made of it, for the browser test's record of a strap.
        const read = result.read;
        performance.mark('camera-read', { detail: { verdict: next.verdict.kind, serial: read?.serial ?? null, reason: result.reason, confidence: read?.confidence ?? 0, digitConfidence: read?.digitConfidence ?? [] } });
        // The same hint as last frame re-renders nothing (React drops an unchanged string).
        setHint(hintFor(next.verdict, result.reason));
        verdictRef.current(next.verdict);
      }
    }

    void start();
    return () => {
      stopped = true;
      stream?.getTracks().forEach((track) => track.stop());
      performance.clearMeasures('camera-frame');
      performance.clearMarks('camera-read');
    };
  }, []);

  const switchTorch = async () => {
    if (!torch) return;
    const on = !torch.on;
    try {
      await torch.track.applyConstraints({ advanced: [{ torch: on } as MediaTrackConstraintSet] });
      setTorch({ ...torch, on });
    } catch {
      setTorch(null);
    }
  };

  if (problem) {
    const { title, text } = CAMERA_PROBLEMS[problem];
    return (
      <View style={styles.wrap} testID="camera-problem">
        <Notice tone="caution" title={title}>
          {text}
        </Notice>
        <Button label="Back to the keypad" onPress={onClose} testID="camera-back" />
      </View>
    );
  }

  return (
    <View style={styles.wrap} testID="camera-panel">
      <View style={[styles.viewport, { borderColor: theme.line, aspectRatio: aspect }]}>
        <video ref={videoRef} muted playsInline autoPlay style={videoStyle} aria-label="Camera view" />
        <View pointerEvents="none" style={[styles.band, { borderColor: theme.brand }]} />
        {progress ? (
          <View style={[styles.loading, { backgroundColor: theme.surfaceRaised }]} accessibilityRole="progressbar" aria-valuenow={Math.round(progress.share * 100)} testID="camera-progress">
            <Text variant="caption">{progress.label}…</Text>
            <View style={[styles.track, { backgroundColor: theme.surfaceSunken }]}>
              <View style={[styles.fill, { width: `${Math.round(progress.share * 100)}%`, backgroundColor: theme.brand }]} />
            </View>
          </View>
        ) : null}
      </View>
      <Text variant="caption" tone="muted" accessibilityLiveRegion="polite" testID="camera-hint">
        {status ?? hint}
      </Text>
      {torch ? (
        <View style={styles.row}>
          <Button compact kind="secondary" label={torch.on ? 'Torch off' : 'Torch on'} onPress={() => void switchTorch()} testID="camera-torch" />
        </View>
      ) : null}
      <Text variant="caption" tone="faint">
        {PRIVACY_NOTE}
      </Text>
    </View>
  );
}

function hintFor(verdict: FrameVerdict, reason: string | null): string {
  switch (verdict.kind) {
    case 'nothing':
      return reason === 'more than one serial in view' ? 'Two serials in view: show one note at a time.' : 'Hold the serial line inside the band.';
    case 'tentative':
      return `Reading ${verdict.read.serial}… hold still.`;
    case 'held':
      return `${verdict.read.serial} is logged. Flip to the next note.`;
    case 'accept':
      return verdict.unsure.length ? `Check the marked digits of ${verdict.read.serial}.` : `Read ${verdict.read.serial}.`;
  }
}

/** Waits for a new video frame (or a short pause where the browser cannot say), so no frame is read twice. */
function nextVideoFrame(video: HTMLVideoElement): Promise<void> {
  const withCallback = video as HTMLVideoElement & { requestVideoFrameCallback?: (callback: () => void) => number };
  return new Promise((resolve) => {
    if (typeof withCallback.requestVideoFrameCallback === 'function') withCallback.requestVideoFrameCallback(() => resolve());
    else setTimeout(resolve, 30);
  });
}

const videoStyle = { width: '100%', height: '100%', objectFit: 'fill', display: 'block' } as const;

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  viewport: { width: '100%', maxHeight: 360, borderRadius: radius.md, overflow: 'hidden', borderWidth: 1, backgroundColor: '#000' },
  band: {
    position: 'absolute',
    left: `${BAND.left * 100}%`,
    top: `${BAND.top * 100}%`,
    width: `${BAND.width * 100}%`,
    height: `${BAND.height * 100}%`,
    borderWidth: 2,
    borderRadius: radius.sm,
    boxShadow: '0 0 0 999px rgba(0,0,0,0.35)',
  },
  loading: { position: 'absolute', left: space.md, right: space.md, bottom: space.md, padding: space.sm, borderRadius: radius.sm, gap: space.xs },
  track: { height: 6, borderRadius: 3, overflow: 'hidden' },
  fill: { height: 6 },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
