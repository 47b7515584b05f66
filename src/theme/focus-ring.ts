/** Native platforms draw their own focus; the web needs a ring (see focus-ring.web.ts). */
export function useFocusRing(): void {}
