import { parseArgs, type ParseArgsConfig } from 'node:util';

type Options = NonNullable<ParseArgsConfig['options']>;

/**
 * The scripts' flags through node:util's parseArgs: `--help` prints the usage and exits before any
 * work starts, and an unknown flag or a missing value stops with the usage instead of being ignored.
 *
 * @example
 * const flags = readFlags(process.argv.slice(2), { seconds: { type: 'string' } }, 'usage: …');
 */
export type Flags<O extends Options> = { [K in keyof O]?: O[K]['type'] extends 'boolean' ? boolean : string };

export function readFlags<O extends Options>(argv: string[], options: O, usage: string): Flags<O> {
  try {
    const { values } = parseArgs({ args: argv, options: { ...options, help: { type: 'boolean', short: 'h' } }, strict: true, allowPositionals: false });
    if ((values as { help?: boolean }).help) {
      process.stdout.write(`${usage}\n`);
      process.exit(0);
    }
    return values as Flags<O>;
  } catch (error) {
    process.stderr.write(`${(error as Error).message}\n\n${usage}\n`);
    process.exit(2);
  }
}

/** A whole number given as a flag, or the default; anything else stops with the usage. */
export function wholeFlag(value: string | boolean | undefined, fallback: number, name: string, usage: string): number {
  if (value === undefined) return fallback;
  const n = Number(value);
  if (typeof value !== 'string' || !Number.isInteger(n) || n <= 0) {
    process.stderr.write(`--${name} must be a positive whole number\n\n${usage}\n`);
    process.exit(2);
  }
  return n;
}
