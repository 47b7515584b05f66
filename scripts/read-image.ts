/**
 * Reads serials from still pictures with the camera's own recognition code.
 *
 *   npm run --silent read-image -- [--json] FILE...
 *
 * One line per file, in the order given. With --json each line is
 * { file, ok, serial, prefix, digits, suffix, star, confidence, accepted } (and `reason` when ok is false).
 * `accepted` is what the camera would do with that single frame. A file that cannot be read gives
 * ok: false and a reason; the run goes on. Exit status 0 when the run completed, 2 for bad usage.
 */
import { stat } from 'node:fs/promises';
import { acceptedAlone } from '../shared/ocr/acceptance';
import { createNodeEngine } from '../src/lib/ocr/node-engine';
import { greyFromFile } from '../src/lib/ocr/node-image';
import { recogniseSerial } from '../src/lib/ocr/recognise';

const USAGE = 'Usage: npm run --silent read-image -- [--json] FILE...';

interface FileResult {
  file: string;
  ok: boolean;
  serial: string | null;
  prefix: string | null;
  digits: string | null;
  suffix: string | null;
  star: boolean | null;
  confidence: number | null;
  accepted: boolean;
  reason?: string;
}

function failed(file: string, reason: string): FileResult {
  return { file, ok: false, serial: null, prefix: null, digits: null, suffix: null, star: null, confidence: null, accepted: false, reason };
}

function describeError(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  if (/ENOENT/.test(text)) return 'no such file';
  if (/EISDIR/.test(text)) return 'is a folder, not a picture';
  if (/EACCES/.test(text)) return 'permission denied';
  if (/unsupported image format|Input buffer|corrupt|premature|VipsJpeg|pngload|bad seek/i.test(text)) return 'not a picture this tool can open';
  if (/pixel limit/i.test(text)) return 'picture too large (over 50 megapixels)';
  return `could not open: ${text.split('\n')[0]}`;
}

function show(result: FileResult, json: boolean): string {
  if (json) return JSON.stringify(result);
  if (!result.ok) return `${result.file}\tnot read: ${result.reason}`;
  return `${result.file}\t${result.serial}\t${(result.confidence ?? 0).toFixed(2)}\t${result.accepted ? 'accepted' : 'unsure'}`;
}

async function main(argv: string[]): Promise<number> {
  const json = argv.includes('--json');
  const unknown = argv.filter((arg) => arg.startsWith('--') && arg !== '--json');
  if (argv.includes('--help')) {
    process.stdout.write(`${USAGE}\n`);
    return 0;
  }
  const files = argv.filter((arg) => !arg.startsWith('--'));
  if (unknown.length > 0 || files.length === 0) {
    process.stderr.write(`${unknown.length ? `Unknown option ${unknown[0]}\n` : ''}${USAGE}\n`);
    return 2;
  }
  const engine = await createNodeEngine();
  try {
    for (const file of files) {
      let result: FileResult;
      try {
        const kind = await stat(file).catch((error: unknown) => error as NodeJS.ErrnoException);
        if (kind instanceof Error) throw kind;
        if (kind.isDirectory()) throw Object.assign(new Error('EISDIR'), { code: 'EISDIR' });
        const image = await greyFromFile(file);
        const { read, reason } = await recogniseSerial(engine, image);
        result = read
          ? {
              file,
              ok: true,
              serial: read.serial,
              prefix: read.prefix,
              digits: read.digits,
              suffix: read.suffix,
              star: read.star,
              confidence: Math.round(read.confidence * 1000) / 1000,
              accepted: acceptedAlone(read),
            }
          : failed(file, reason ?? 'no serial found');
      } catch (error) {
        result = failed(file, describeError(error));
      }
      process.stdout.write(`${show(result, json)}\n`);
    }
  } finally {
    await engine.close();
  }
  return 0;
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (error: unknown) => {
    process.stderr.write(`read-image: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exit(1);
  },
);
