let audio: AudioContext | null = null;

/**
 * A find announces itself: two short rising tones (Web Audio, no sound file to load) and a buzz where the
 * browser can. The audio context is made on first use, after the tap that opened the camera.
 */
export function announceFind(options: { sound: boolean; vibrate: boolean }): void {
  if (options.sound) {
    try {
      audio ??= new AudioContext();
      const now = audio.currentTime;
      for (const [offset, frequency] of [[0, 880], [0.09, 1320]] as const) {
        const tone = audio.createOscillator();
        const gain = audio.createGain();
        tone.frequency.value = frequency;
        gain.gain.setValueAtTime(0.0001, now + offset);
        gain.gain.exponentialRampToValueAtTime(0.25, now + offset + 0.01);
        gain.gain.exponentialRampToValueAtTime(0.0001, now + offset + 0.08);
        tone.connect(gain).connect(audio.destination);
        tone.start(now + offset);
        tone.stop(now + offset + 0.09);
      }
    } catch {
      // No audio output (or autoplay refused): the badge on screen still shows the find.
    }
  }
  if (options.vibrate && typeof navigator !== 'undefined' && typeof navigator.vibrate === 'function') navigator.vibrate([60, 40, 60]);
}
