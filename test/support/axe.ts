import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
// axe-core ships its whole engine as one string meant to be evaluated in the page.
const { source } = require('axe-core') as { source: string };

/** WCAG 2.0/2.1 A and AA, plus axe's best practices (landmarks, one level-one heading). */
const TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'];

export interface AxeFinding {
  rule: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/** Runs axe-core in the page as it stands and returns every violation, one line per rule. */
export async function axeViolations(page: Page): Promise<AxeFinding[]> {
  const injected = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe !== 'undefined');
  // Evaluated through the DevTools protocol, which the page's Content-Security-Policy (script-src 'self') does not block.
  if (!injected) await page.evaluate(source);
  return page.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run(context: Document, options: object): Promise<{ violations: Array<{ id: string; impact: string | null; help: string; nodes: Array<{ target: unknown[] }> }> }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return result.violations.map((violation) => ({
      rule: violation.id,
      impact: violation.impact,
      help: violation.help,
      targets: violation.nodes.slice(0, 5).map((node) => node.target.map(String).join(' ')),
    }));
  }, TAGS);
}
