/**
 * The sequential-chance calibration TRADE.md asks for, at full size: 2,000 random bricks of 4,000 new notes in
 * sequence, each pattern's real count judged at the 95% level by the exact run distribution (what Tally uses for
 * hunts in sequence) and, for contrast, by Poisson (what it used before). A sound test says "more than chance" in
 * at most 5% of bricks plus noise, and the same for "fewer". Writes its section of docs/PERFORMANCE.md.
 */
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PATTERN_IDS, PATTERN_NAMES, VERDICT_LEVEL, runDistribution } from '../../../shared/engine';
import { writeDocSection } from '../../support/doc-section';
import { calibrate } from '../../support/sequential-calibration';

const root = fileURLToPath(new URL('../../..', import.meta.url));
const write = !process.argv.includes('--no-write');
const BRICKS = 2000;

const t0 = performance.now();
runDistribution('trinary', 4000, { domainLast: 96_000_000 });
const buildMs = performance.now() - t0;

const t1 = performance.now();
const result = calibrate(BRICKS, 20261202);
const seconds = (performance.now() - t1) / 1000;

const limit = VERDICT_LEVEL + 3 * Math.sqrt((VERDICT_LEVEL * (1 - VERDICT_LEVEL)) / BRICKS);
const pct = (n: number) => `${((100 * n) / BRICKS).toFixed(1)}%`;
let ok = true;
const rows = PATTERN_IDS.map((id) => {
  const fine = result.more[id] / BRICKS <= limit && result.fewer[id] / BRICKS <= limit;
  ok &&= fine;
  return `| ${PATTERN_NAMES[id]} | ${pct(result.more[id])} | ${pct(result.fewer[id])} | ${pct(result.poissonMore[id])} | ${pct(result.poissonFewer[id])} | ${fine ? 'yes' : '**no**'} |`;
});
const text = [
  '## Honest chance for notes in sequence',
  '',
  `Measured ${new Date().toISOString().slice(0, 10)} by \`tsx test/bench/engine/sequential-bench.ts\` (part of \`npm run bench\`): ${BRICKS.toLocaleString('en-US')} random bricks of 4,000 consecutive serials,`,
  `each pattern's count judged at the 95% level. Limit: 5% + 3 standard errors = ${(100 * limit).toFixed(1)}% of bricks. ${seconds.toFixed(1)} s for the whole run`,
  `(a sweep and two verdict tables per brick); the exact distribution of trinaries in a 4,000-note run over the $1–$20 domain builds in ${buildMs.toFixed(0)} ms, then is cached.`,
  '',
  '| pattern | "more", exact run distribution | "fewer", exact | "more", Poisson (before) | "fewer", Poisson (before) | within 5% + noise |',
  '| --- | --- | --- | --- | --- | --- |',
  ...rows,
  '',
  'The exact test is discrete, so it flags less often than 5% where few counts are possible; Poisson treated the 4,000 notes as',
  'independent draws and so called clumped finds (trinaries in runs, a brick with none) unusual far too often.',
  '',
].join('\n');
process.stdout.write(`${text}\n${ok ? 'Calibration within 5% + noise for every pattern.' : 'Calibration MISSED for some pattern.'}\n`);
if (write) writeDocSection(join(root, 'docs/PERFORMANCE.md'), text, 'Performance');
process.exitCode = ok ? 0 : 1;
