/** Calls back when the browser says the network is back. */
export function onNetworkReturn(callback: () => void): () => void {
  if (typeof window === 'undefined') return () => undefined;
  window.addEventListener('online', callback);
  return () => window.removeEventListener('online', callback);
}
