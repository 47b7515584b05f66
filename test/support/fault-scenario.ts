import { randomUUID } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { createDataSource } from '../../server/db/data-source';
import { ScanQueue } from '../../src/lib/storage/scan-queue';
import { ApiProcess, OwnCluster, fetchTransport, killOneWorker, memoryStorage } from './fault-rig';

export interface FaultScenario {
  clients: number;
  totalScans: number;
  apiPort: number;
  pgPort: number;
  /** Run the API as a cluster of this many processes (npm start's way) and kill one worker at a time. */
  workers?: number;
}

export interface FaultOutcome {
  clients: number;
  sent: number;
  stored: number;
  distinct: number;
  lost: number;
  doubled: number;
  /** Upload calls that failed (connection cut, 5xx) and were retried by the queues. */
  failedCalls: number;
  apiRestarts: number;
  databaseRestarts: number;
  seconds: number;
}

/**
 * Simulated hunters log notes into the app's own offline queue while the API process is killed twice
 * and PostgreSQL restarted once; afterwards the database must hold every note exactly once.
 */
export async function runFaultScenario({ clients, totalScans, apiPort, pgPort, workers }: FaultScenario): Promise<FaultOutcome> {
  const started = Date.now();
  let failedCalls = 0;
  const cluster = new OwnCluster(`pg-faults-${pgPort}`, pgPort);
  cluster.start();
  const api = new ApiProcess(
    apiPort,
    {
      DATABASE_URL: cluster.url,
      JWT_SECRET: 'fault-rig-secret-0123456789-abcdefghijklmnop',
      NODE_ENV: 'test',
      // Each simulated hunter signs up from an address of its own, as if behind a balancer on loopback.
      TRUSTED_PROXIES: '127.0.0.1',
      ...(workers ? { WORKERS: String(workers) } : {}),
    },
    workers ? { script: 'server/cluster.ts' } : {},
  );
  // One process: kill and start it again. A cluster: kill one worker; its primary starts another.
  const crash = () => (workers ? killOneWorker(api.baseUrl).then(() => undefined) : api.restart());
  try {
    const migrator = createDataSource(cluster.url);
    await migrator.initialize();
    await migrator.runMigrations();
    await migrator.destroy();
    await api.start();

    const hunters = await Promise.all(
      Array.from({ length: clients }, async (_, index) => {
        const email = `fault-${index}-${randomUUID().slice(0, 6)}@strapsift.test`;
        const session = await postJson(`${api.baseUrl}/api/auth/register`, { email, password: 'fault-rig-password', displayName: `Hunter ${index}` }, undefined, `10.0.0.${index + 1}`);
        const hunt = await postJson(
          `${api.baseUrl}/api/hunts`,
          { title: `Fault hunt ${index}`, source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 400 },
          session.token,
        );
        const transport = fetchTransport(api.baseUrl, session.token);
        const counted = {
          upload: (scans: Parameters<typeof transport.upload>[0]) =>
            transport.upload(scans).catch((error: unknown) => {
              failedCalls += 1;
              throw error;
            }),
          remove: transport.remove,
        };
        const queue = new ScanQueue(`fault-${index}`, counted, memoryStorage(), {
          batchSize: 100,
          debounceMs: 20,
          firstBackoffMs: 100,
          maxBackoffMs: 1000,
        });
        return { huntId: hunt.id as string, queue };
      }),
    );

    const perClient = Math.floor(totalScans / clients);
    const sent = perClient * clients;
    // Logging is spread over about three seconds so the crashes land while batches are in flight.
    const pause = Math.max(5, Math.round(3000 / Math.max(1, perClient / 10)));
    const producers = hunters.map(async ({ huntId, queue }, index) => {
      for (let n = 0; n < perClient; n++) {
        const value = 10_000_000 + index * 1_000_000 + n;
        await queue.add({
          id: randomUUID(),
          huntId,
          strap: Math.floor(n / 100) + 1,
          serial: String(value),
          star: false,
          pulled: false,
          scannedAt: new Date(Date.parse('2026-11-02T10:00:00Z') + n * 1000).toISOString(),
        });
        if (n % 10 === 9) await sleep(pause);
      }
    });
    const chaos = (async () => {
      await sleep(700);
      await crash();
      await sleep(700);
      cluster.restart();
      await sleep(700);
      await crash();
    })();
    await Promise.all([...producers, chaos]);

    const deadline = Date.now() + 180_000;
    while (hunters.some(({ queue }) => queue.getSnapshot().waiting > 0)) {
      if (Date.now() > deadline) throw new Error('queues did not drain within 3 minutes');
      for (const { queue } of hunters) if (queue.getSnapshot().waiting > 0) queue.retryNow();
      await sleep(250);
    }
    for (const { queue } of hunters) queue.dispose();

    const counter = createDataSource(cluster.url);
    await counter.initialize();
    const [{ stored, distinct }] = await counter.query(
      'SELECT count(*)::int AS stored, count(DISTINCT (hunt_id, digits))::int AS distinct FROM scans WHERE hunt_id = ANY($1::uuid[])',
      [hunters.map((hunter) => hunter.huntId)],
    );
    await counter.destroy();
    return {
      clients,
      sent,
      stored,
      distinct,
      lost: sent - distinct,
      doubled: stored - distinct,
      failedCalls,
      apiRestarts: 2,
      databaseRestarts: 1,
      seconds: (Date.now() - started) / 1000,
    };
  } finally {
    await api.stop();
    cluster.stop();
  }
}

async function postJson(url: string, body: unknown, token?: string, from?: string) {
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}), ...(from ? { 'X-Forwarded-For': from } : {}) },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${url} answered ${response.status}: ${await response.text()}`);
  return response.json();
}
