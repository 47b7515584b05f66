import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs, newCollector } from '../support/api-client';
import { axeViolations, type AxeFinding } from '../support/axe';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo } from '../support/browser';

mkdirSync('test-results/screenshots/a11y', { recursive: true });

const THEMES = [
  ['paper', 'light'],
  ['graphite', 'dark'],
] as const;

interface Found {
  screen: string;
  theme: string;
  findings: AxeFinding[];
}

/**
 * Opens a screen and judges it with axe-core (WCAG 2.1 A and AA, plus best practice: landmarks and
 * one level-one heading) in both themes. The theme follows the system setting, so switching the
 * emulated colour scheme repaints the same page without a reload.
 */
async function judge(page: Page, path: string, shot: string, found: Found[]): Promise<void> {
  await page.goto(`${baseUrl()}${path}`);
  await page.waitForSelector('[aria-level="1"]', { state: 'attached' });
  await page.waitForLoadState('networkidle');
  for (const [theme, colorScheme] of THEMES) {
    await page.emulateMedia({ colorScheme });
    await page.waitForTimeout(100);
    const headings = await page.locator('[aria-level="1"]').count();
    const findings = await axeViolations(page);
    if (headings !== 1) findings.push({ rule: 'one-level-one-heading', impact: 'moderate', help: `${headings} level-one headings`, targets: [] });
    if (findings.length) found.push({ screen: path, theme, findings });
    await page.screenshot({ path: `test-results/screenshots/a11y/${shot}-${theme}.png` });
  }
  const ring = await focusRing(page);
  if (ring) found.push({ screen: path, theme: 'keyboard', findings: [{ rule: 'visible-focus', impact: 'serious', help: ring, targets: [ring] }] });
}

/** Tabs to the first control and reports when keyboard focus has no clear ring (null when it does). */
async function focusRing(page: Page): Promise<string | null> {
  await page.keyboard.press('Tab');
  return page.evaluate(() => {
    const element = document.activeElement as HTMLElement | null;
    const controls = document.querySelectorAll('a[href], button:not([disabled]), input, select, textarea, [tabindex]:not([tabindex="-1"])').length;
    // A page with nothing to operate (an unknown share or invitation link) has no focus to show.
    if (!element || element === document.body) return controls ? `Tab reached none of the ${controls} controls` : null;
    const style = getComputedStyle(element);
    const width = parseFloat(style.outlineWidth);
    return style.outlineStyle !== 'none' && width >= 2 ? null : `${element.tagName} "${element.getAttribute('aria-label') ?? element.textContent?.slice(0, 30)}" has outline ${style.outlineStyle} ${style.outlineWidth}`;
  });
}

function report(found: Found[]): string {
  return found
    .map(({ screen, theme, findings }) => `${screen} (${theme}): ${findings.map((f) => `${f.rule} [${f.impact}] ${f.targets.join(' | ')}`).join('; ')}`)
    .join('\n');
}

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('accessibility of every screen on a %s, in both themes (axe-core)', (size, viewport) => {
  it('when signed out, then the sign-in, account, password, share, invitation and missing pages have no violations', async () => {
    const browser = await openBrowser(viewport);
    const found: Found[] = [];
    try {
      for (const path of ['/sign-in', '/create-account', '/forgot-password', '/reset-password?token=unknown', '/share/unknown-token', '/invite/unknown-code', '/no-such-page']) {
        await judge(browser.page, path, `signed-out${path.split('?')[0]!.replace(/\//g, '-')}-${size}`, found);
      }
    } finally {
      await browser.close();
    }
    expect(report(found)).toBe('');
  });

  it('when a brand-new hunter opens every screen and starts a first hunt, then no screen has a violation', async () => {
    const browser = await openBrowser(viewport);
    const found: Found[] = [];
    try {
      const account = await newCollector(`a11y-${size}`);
      await signInAsDemo(browser.page, account);
      for (const path of ['/sift', '/hunts', '/keepers', '/keepers/new', '/odds', '/sweep', '/tally', '/you']) {
        await judge(browser.page, path, `new${path.replace(/\//g, '-')}-${size}`, found);
      }
      // The first hunt, one tap away; then the keypad and the hunt page.
      await browser.page.goto(`${baseUrl()}/sift`);
      await browser.page.getByTestId('start-hunt').click();
      await browser.page.getByTestId('keypad').waitFor();
      await judge(browser.page, '/sift', `new-sift-keypad-${size}`, found);
      const call = await apiAs(account.email, account.password);
      const { body } = await call<{ items: { id: string }[] }>('/hunts?limit=1');
      await judge(browser.page, `/hunts/${body.items[0]!.id}`, `new-hunt-${size}`, found);
    } finally {
      await browser.close();
    }
    expect(report(found)).toBe('');
  });

  it('when the demo collector opens every screen, with hunts, keepers and photos, then no screen has a violation', async () => {
    const browser = await openBrowser(viewport);
    const found: Found[] = [];
    try {
      await signInAsDemo(browser.page);
      const call = await apiAs('demo@strapsift.test', 'sift-demo-2026');
      const hunts = await call<{ items: { id: string; hits: number }[] }>('/hunts?limit=50');
      const keepers = await call<{ items: { id: string; photoCount?: number }[] }>('/keepers?limit=50');
      const hunt = [...hunts.body.items].sort((a, b) => b.hits - a.hits)[0]!;
      const keeper = keepers.body.items[0]!;
      for (const path of ['/sift', '/hunts', `/hunts/${hunt.id}`, '/keepers', `/keepers/${keeper.id}`, '/odds', '/sweep', '/tally', '/you']) {
        await judge(browser.page, path, `demo${path.replace(/\//g, '-').replace(/-[0-9a-f-]{36}$/, '-detail')}-${size}`, found);
      }
    } finally {
      await browser.close();
    }
    expect(report(found)).toBe('');
  });

  it('when the admin opens the console, then it has no violation', async () => {
    const browser = await openBrowser(viewport);
    const found: Found[] = [];
    try {
      await signInAsDemo(browser.page, { email: 'admin@strapsift.test', password: 'console-demo-2026' });
      await judge(browser.page, '/console', `admin-console-${size}`, found);
    } finally {
      await browser.close();
    }
    expect(report(found)).toBe('');
  });
});
