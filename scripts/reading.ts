/**
 * Readings from the command line.
 *
 *   tsx scripts/reading.ts [options] [SERIAL …]      read the serials given, or one per line on stdin
 *   tsx scripts/reading.ts --json < serials.txt      one JSON object per input line
 *   tsx scripts/reading.ts --sweep FIRST COUNT [--patterns a,b] [--json]
 *
 * Options: --low-limit 9|99|999|9999|99999, --watch PATTERN (repeatable),
 * --series S, --district L, --facility DC|FW, --denomination N, --star,
 * --star-run N, --note-type federal-reserve|older, --help.
 */
import {
  DEFAULT_WEIGHTS,
  NEAR_MISS_PATTERN_IDS,
  PATTERN_IDS,
  PATTERN_NAMES,
  describeNearMiss,
  isLowLimit,
  parseSerial,
  parseWatchPattern,
  read,
  sweep,
} from '../shared/engine';
import { runEndFor } from '../shared/trade';
import type { PatternId, ReadOptions, ReadResult, Reading } from '../shared/engine';

const USAGE = `Usage:
  tsx scripts/reading.ts [options] [SERIAL ...]   read serials (or one per line on stdin)
  tsx scripts/reading.ts --json                   one JSON object per stdin line
  tsx scripts/reading.ts --sweep FIRST COUNT [--patterns a,b] [--json]

Options:
  --json                 machine-readable output, one JSON object per line
  --low-limit N          9, 99, 999 (default), 9999 or 99999
  --watch PATTERN        a watch pattern (0704????, 1000-2000, date:2024-07-04); repeatable
  --series S             series as printed, e.g. 2013 or 1988A (adds trade notes)
  --district L           district letter A–L
  --facility DC|FW       printing facility
  --denomination N       face value in dollars (checks the serial format; neighbours and sweeps stop at its run end)
  --star                 treat every note as a star note
  --star-run N           the star run's size, as looked up (runs of 640,000 or fewer are small)
  --note-type T          federal-reserve (default) or older (silver certificates, United States notes)
  --patterns a,b         patterns to sweep (default: all): ${PATTERN_IDS.join(', ')}
  --help                 this text`;

interface Cli {
  json: boolean;
  sweep: { first: string; count: number } | null;
  patterns: PatternId[] | null;
  options: ReadOptions;
  serials: string[];
}

function fail(message: string): never {
  process.stderr.write(`${message}\n\n${USAGE}\n`);
  process.exit(2);
}

function parseArgs(argv: string[]): Cli {
  const cli: Cli = { json: false, sweep: null, patterns: null, options: {}, serials: [] };
  const watch: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    const value = (): string => {
      const v = argv[++i];
      if (v === undefined) fail(`${arg} needs a value`);
      return v;
    };
    switch (arg) {
      case '--help':
      case '-h':
        process.stdout.write(`${USAGE}\n`);
        return process.exit(0);
      case '--json':
        cli.json = true;
        break;
      case '--sweep': {
        const first = value();
        const count = Number(value());
        if (!Number.isInteger(count)) fail('--sweep COUNT must be a whole number');
        cli.sweep = { first, count };
        break;
      }
      case '--patterns': {
        const ids = value().split(',').filter((p) => p !== '');
        const unknown = ids.filter((p) => !(PATTERN_IDS as readonly string[]).includes(p));
        if (unknown.length > 0) fail(`unknown pattern ${unknown.join(', ')}`);
        cli.patterns = ids as PatternId[];
        break;
      }
      case '--low-limit': {
        const n = Number(value());
        if (!isLowLimit(n)) fail('--low-limit must be 9, 99, 999, 9999 or 99999');
        cli.options.lowLimit = n;
        break;
      }
      case '--watch': {
        const text = value();
        const parsed = parseWatchPattern(text);
        if (!parsed.ok) fail(`--watch ${text}: ${parsed.error.message}`);
        watch.push(text);
        break;
      }
      case '--series':
        cli.options.series = value();
        break;
      case '--district':
        cli.options.district = value();
        break;
      case '--facility': {
        const f = value().toUpperCase();
        if (f !== 'DC' && f !== 'FW') fail('--facility must be DC or FW');
        cli.options.facility = f;
        break;
      }
      case '--denomination': {
        const n = Number(value());
        if (runEndFor(n) === null) fail('--denomination must be 1, 2, 5, 10, 20, 50 or 100');
        cli.options.denomination = n;
        break;
      }
      case '--star':
        cli.options.star = true;
        break;
      case '--star-run': {
        const n = Number(value());
        if (!Number.isInteger(n) || n < 1) fail('--star-run must be a whole number of notes');
        cli.options.starRunSize = n;
        break;
      }
      case '--note-type': {
        const t = value();
        if (t !== 'federal-reserve' && t !== 'older') fail('--note-type must be federal-reserve or older');
        cli.options.noteType = t;
        break;
      }
      default:
        if (arg.startsWith('--')) fail(`unknown option ${arg}`);
        cli.serials.push(arg);
    }
  }
  if (watch.length > 0) cli.options.watch = watch;
  return cli;
}

/** The fields issue 3 lists for the JSON line of one input, with the serial's parts and trade notes (issue 12). */
function jsonLine(result: ReadResult): string {
  if (!result.ok) return JSON.stringify({ input: result.input, ok: false, error: result.error });
  const { prefix, seriesLetter, district, suffix, star } = result;
  return JSON.stringify({
    input: result.input,
    ok: true,
    digits: result.digits,
    patterns: result.patterns,
    lowTier: result.lowTier,
    longestRun: result.longestRun,
    maxDigitCount: result.maxDigitCount,
    distinctDigits: result.distinctDigits,
    nearMiss: result.nearMiss,
    neighbours: result.neighbours,
    odds: result.odds,
    score: result.score,
    serial: { prefix, seriesLetter, district, suffix, star },
    tradeNotes: result.trade.map(({ id, severity, text, source }) => ({ id, severity, text, source })),
  });
}

function grouped(n: number): string {
  return Math.round(n).toLocaleString('en-US');
}

function bestMiss(r: Reading): string {
  let best: string | null = null;
  let distance = 9;
  for (const id of NEAR_MISS_PATTERN_IDS) {
    const miss = r.nearMiss[id];
    if (miss.distance > 0 && miss.distance < distance) {
      distance = miss.distance;
      best = describeNearMiss(id, miss);
    }
  }
  return best ?? '';
}

const COLUMNS = ['input', 'digits', 'patterns', '1 in N', 'points', 'score', 'keep', 'nearest miss'] as const;
const WIDTHS = [18, 8, 34, 13, 6, 6, 4, 0];

function row(cells: string[]): string {
  return cells.map((c, i) => (WIDTHS[i] ? c.padEnd(WIDTHS[i]!) : c)).join('  ').trimEnd();
}

function tableLine(result: ReadResult): string {
  const input = result.input.length > 18 ? `${result.input.slice(0, 17)}…` : result.input;
  if (!result.ok) return row([input, '', `error: ${result.error.message}`]);
  const combo = result.odds.combination;
  return row([
    input,
    result.digits,
    result.patterns.map((p) => PATTERN_NAMES[p]).join(', ') || '—',
    combo ? grouped(combo.oneIn) : '',
    combo ? combo.points.toFixed(2) : '',
    String(result.score.points),
    result.score.keep ? 'keep' : '',
    bestMiss(result),
  ]);
}

/** Collects output and writes it in large blocks, waiting when the pipe is full. */
class Output {
  private parts: string[] = [];
  private size = 0;

  async line(text: string): Promise<void> {
    this.parts.push(text, '\n');
    this.size += text.length + 1;
    if (this.size >= 1 << 16) await this.flush();
  }

  async flush(): Promise<void> {
    if (this.parts.length === 0) return;
    const block = this.parts.join('');
    this.parts = [];
    this.size = 0;
    if (!process.stdout.write(block)) await new Promise<void>((resolve) => process.stdout.once('drain', resolve));
  }
}

async function readAll(cli: Cli, out: Output): Promise<void> {
  const emit = (text: string) => out.line(cli.json ? jsonLine(read(text, cli.options)) : tableLine(read(text, cli.options)));
  if (!cli.json) await out.line(row([...COLUMNS]));
  if (cli.serials.length > 0) {
    for (const s of cli.serials) await emit(s);
    return;
  }
  let pending = '';
  process.stdin.setEncoding('utf8');
  for await (const chunk of process.stdin) {
    pending += chunk as string;
    const lines = pending.split('\n');
    pending = lines.pop()!;
    for (const line of lines) await emit(line.endsWith('\r') ? line.slice(0, -1) : line);
  }
  if (pending !== '') await emit(pending.endsWith('\r') ? pending.slice(0, -1) : pending);
}

async function runSweep(cli: Cli, out: Output): Promise<void> {
  const { count } = cli.sweep!;
  const parsed = parseSerial(cli.sweep!.first);
  if (!parsed.ok) fail(`--sweep FIRST: ${parsed.error.message}`);
  let result;
  try {
    result = sweep(parsed.digits, count, cli.patterns ?? PATTERN_IDS, {
      lowLimit: cli.options.lowLimit ?? DEFAULT_WEIGHTS.lowLimit,
      last: runEndFor(cli.options.denomination)?.last,
    });
  } catch (error) {
    fail(`--sweep: ${(error as Error).message}`);
  }
  if (cli.json) {
    for (const hit of result.hits) await out.line(JSON.stringify({ serial: hit.serial, patterns: hit.patterns }));
    return;
  }
  await out.line(`serial    patterns`);
  for (const hit of result.hits) await out.line(`${hit.serial}  ${hit.patterns.map((p) => PATTERN_NAMES[p]).join(', ')}`);
  const cut = result.truncated ? ` (stopped at ${String(result.last).padStart(8, '0')})` : '';
  await out.line(`${grouped(result.hits.length)} hits in ${String(result.first).padStart(8, '0')}–${String(result.last).padStart(8, '0')}, ${grouped(result.count)} serials${cut}`);
}

async function main(): Promise<void> {
  const cli = parseArgs(process.argv.slice(2));
  const out = new Output();
  if (cli.sweep) await runSweep(cli, out);
  else await readAll(cli, out);
  await out.flush();
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.stack : String(error)}\n`);
  process.exit(1);
});
