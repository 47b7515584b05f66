import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const PHONE = { width: 390, height: 844 } as const;
export const WIDE = { width: 1440, height: 900 } as const;

export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error('E2E_BASE_URL is not set; run the browser tests with `npm test`');
  return url;
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/**
 * Debian's Chromium through playwright-core, with the flags this closed network needs
 * (no background networking, no component updates) and a throwaway profile.
 */
export async function openBrowser(
  viewport: { width: number; height: number },
  options: { colorScheme?: 'light' | 'dark'; extraArgs?: string[] } = {},
): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'strapsift-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport,
    deviceScaleFactor: 1,
    colorScheme: options.colorScheme ?? 'light',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      ...(options.extraArgs ?? []),
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signInAsDemo(page: Page, account = { email: 'demo@strapsift.test', password: 'sift-demo-2026' }): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByTestId('sign-in-email').fill(account.email);
  await page.getByTestId('sign-in-password').fill(account.password);
  await page.getByTestId('sign-in-submit').click();
  await page.waitForURL(/\/sift/);
}

/**
 * The page scrolls inside react-native-web's ScrollView, not the document, so Playwright's fullPage
 * sees one screen. The window is made as tall as the scrolled content for the shot, then put back.
 */
export async function shootWhole(page: Page, path: string): Promise<void> {
  const viewport = page.viewportSize()!;
  const extra = await page.evaluate(() =>
    Math.max(
      0,
      ...Array.from(document.querySelectorAll('div'))
        .filter((el) => /(auto|scroll)/.test(getComputedStyle(el).overflowY) && el.clientHeight > 0)
        .map((el) => el.scrollHeight - el.clientHeight),
    ),
  );
  await page.setViewportSize({ width: viewport.width, height: Math.min(viewport.height + extra, 8000) });
  await page.waitForTimeout(150);
  await page.screenshot({ path });
  await page.setViewportSize(viewport);
}
