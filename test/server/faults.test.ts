import { describe, expect, it } from 'vitest';
import { runFaultScenario } from '../support/fault-scenario';

describe('exactly once through crashes (short form; `npm run load` runs 10,000 notes)', () => {
  it('when 20 hunters log 2,000 notes while the API is killed twice and PostgreSQL restarted once, then every note is stored exactly once', async () => {
    const outcome = await runFaultScenario({ clients: 20, totalScans: 2000, apiPort: 8188, pgPort: 54388 });
    expect(outcome).toMatchObject({ sent: 2000, stored: 2000, distinct: 2000, lost: 0, doubled: 0 });
    // The crashes must have hit live traffic, or the test proves nothing.
    expect(outcome.failedCalls).toBeGreaterThan(0);
  }, 240_000);
});
