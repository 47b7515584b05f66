import { randomUUID } from 'node:crypto';

/**
 * The latency figure: each of the 50 hunters runs its own loop over real HTTP (keep-alive fetch),
 * sending its next request on a fixed pace and timing each from send to the last byte. Unlike a
 * rate-limited benchmark connection, the wait for the next slot is never counted as latency.
 */
export async function pacedHunters(
  baseUrl: string,
  sessions: { token: string; huntId: string; index: number }[],
  ratePerHunter: number,
  durationMs: number,
): Promise<{ latencies: Record<string, number[]>; requests: number; failures: number }> {
  const latencies: Record<string, number[]> = { batch: [], hunts: [], tally: [], straps: [] };
  let requests = 0;
  let failures = 0;
  const end = Date.now() + durationMs;
  const gap = 1000 / ratePerHunter;
  await Promise.all(
    sessions.map(async (hunter) => {
      let serial = 30_000_000 + hunter.index * 100_000;
      let step = 0;
      // Spread the hunters' first requests over one gap so they don't all fire together.
      await new Promise((done) => setTimeout(done, Math.random() * gap));
      while (Date.now() < end) {
        const kind = (['batch', 'hunts', 'tally', 'straps'] as const)[step++ % 4];
        const headers = { authorization: `Bearer ${hunter.token}`, 'content-type': 'application/json' };
        const started = performance.now();
        let response: Response;
        if (kind === 'batch') {
          const scans = Array.from({ length: 20 }, () => ({
            id: randomUUID(),
            huntId: hunter.huntId,
            strap: 1,
            serial: String((serial += 1)),
            scannedAt: new Date().toISOString(),
          }));
          response = await fetch(`${baseUrl}/api/scans/batch`, { method: 'POST', headers, body: JSON.stringify({ scans }) });
        } else {
          const path = kind === 'hunts' ? '/api/hunts' : `/api/hunts/${hunter.huntId}/${kind}`;
          response = await fetch(`${baseUrl}${path}`, { headers });
        }
        await response.arrayBuffer();
        const took = performance.now() - started;
        requests += 1;
        if (!response.ok) failures += 1;
        latencies[kind].push(took);
        const wait = gap - took;
        if (wait > 0) await new Promise((done) => setTimeout(done, wait));
      }
    }),
  );
  return { latencies, requests, failures };
}

