/** Native builds rely on the queue's own backoff; there is no 'online' event to listen to. */
export function onNetworkReturn(_callback: () => void): () => void {
  return () => undefined;
}
