import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

describe('engine and trade sources', () => {
  const files = [...sources(join(root, 'shared/engine')), ...sources(join(root, 'shared/trade'))];

  it('when every import is listed, then all are relative and extensionless (no Node, React or other packages)', () => {
    const offending: string[] = [];
    for (const file of files) {
      const text = readFileSync(file, 'utf8');
      const specs = [
        ...text.matchAll(/^\s*(?:import|export)\b[^;]*?\bfrom\s*['"]([^'"]+)['"]/gm),
        ...text.matchAll(/\bimport\s*\(\s*['"]([^'"]+)['"]/g),
        ...text.matchAll(/^\s*import\s*['"]([^'"]+)['"]/gm),
      ];
      for (const match of specs) {
        const spec = match[1]!;
        if (!spec.startsWith('.') || /\.(ts|js|mjs)$/.test(spec)) offending.push(`${file}: ${spec}`);
      }
    }
    expect(files.length).toBeGreaterThan(10);
    expect(offending).toEqual([]);
  });

  it('when the code is searched for I/O and globals of Node or the browser, then none are used', () => {
    const banned = /\b(process|require|Buffer|fetch|window|document|localStorage|console|setTimeout|setInterval)\s*[.(]/;
    const hits = files.filter((file) => banned.test(readFileSync(file, 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '')));
    expect(hits).toEqual([]);
  });

  it('when file names are listed, then they are kebab-case', () => {
    const names = files.map((f) => f.split('/').at(-1)!);
    expect(names.filter((n) => !/^[a-z0-9]+(-[a-z0-9]+)*\.ts$/.test(n))).toEqual([]);
  });
});

describe('public API documentation', () => {
  it('when every function exported from the engine and trade entries is looked up, then its TSDoc carries an @example', () => {
    const engineFiles = sources(join(root, 'shared/engine')).concat(sources(join(root, 'shared/trade')));
    const texts = engineFiles.map((f) => readFileSync(f, 'utf8'));
    const exported = [
      ...readFileSync(join(root, 'shared/engine/index.ts'), 'utf8').matchAll(/^export \{([^}]+)\}/gm),
      ...readFileSync(join(root, 'shared/trade/index.ts'), 'utf8').matchAll(/^export \{([^}]+)\}/gm),
    ]
      .flatMap((m) => m[1]!.split(','))
      .map((name) => name.trim())
      .filter((name) => /^[a-z]/.test(name));
    const undocumented = exported.filter((name) => {
      const text = texts.find((t) => new RegExp(`export function ${name}\\b`).test(t));
      if (!text) return true;
      const at = text.search(new RegExp(`export function ${name}\\b`));
      const before = text.slice(0, at);
      const doc = before.split('/**').at(-1) ?? '';
      return !/\*\/\s*$/.test(before) || !doc.includes('@example');
    });
    expect(exported.length).toBeGreaterThan(25);
    expect(undocumented).toEqual([]);
  });
});
