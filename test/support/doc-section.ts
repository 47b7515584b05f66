import { existsSync, readFileSync, writeFileSync } from 'node:fs';

/**
 * Replaces one `## Heading` section of a measurements page (docs/PERFORMANCE.md, docs/RELIABILITY.md),
 * or appends it, leaving every other section as it was. `section` starts with its own heading line.
 */
export function writeDocSection(path: string, section: string, title: string): void {
  const heading = section.split('\n', 1)[0];
  const existing = existsSync(path) ? readFileSync(path, 'utf8') : `# ${title}\n`;
  const escaped = heading.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const start = existing.search(new RegExp(`^${escaped}\\s*$`, 'm'));
  let next: string;
  if (start < 0) {
    next = `${existing.trimEnd()}\n\n${section}`;
  } else {
    const rest = existing.slice(start + 1);
    const end = rest.search(/^## /m);
    next = existing.slice(0, start) + section.trimEnd() + '\n' + (end < 0 ? '' : `\n${rest.slice(end)}`);
  }
  writeFileSync(path, `${next.trimEnd()}\n`);
}
