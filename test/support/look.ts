// Screenshots of signed-in pages at phone and wide sizes, for looking at what we build:
//   tsx test/support/look.ts http://127.0.0.1:8095 sift odds hunts
// Pictures go to test-results/look/<page>-<size>.png.
import { mkdirSync } from 'node:fs';
import { PHONE, WIDE, openBrowser } from './browser';

async function main(): Promise<void> {
  const [base, ...pages] = process.argv.slice(2);
  if (!base) throw new Error('usage: tsx test/support/look.ts BASE_URL page…');
  process.env.E2E_BASE_URL = base;
  mkdirSync('test-results/look', { recursive: true });
  for (const [size, viewport] of [
    ['phone', PHONE],
    ['wide', WIDE],
  ] as const) {
    const browser = await openBrowser(viewport);
    try {
      const { page } = browser;
      const errors: string[] = [];
      page.on('pageerror', (error) => errors.push(String(error)));
      page.on('console', (message) => message.type() === 'error' && errors.push(message.text()));
      await page.goto(`${base}/sign-in`);
      await page.getByTestId('sign-in-email').fill(process.env.LOOK_EMAIL ?? 'demo@strapsift.test');
      await page.getByTestId('sign-in-password').fill(process.env.LOOK_PASSWORD ?? 'sift-demo-2026');
      await page.getByTestId('sign-in-submit').click();
      await page.waitForURL(/\/sift/);
      for (const name of pages.length ? pages : ['sift']) {
        await page.goto(`${base}/${name}`);
        await page.waitForTimeout(1500);
        const file = `test-results/look/${name.replace(/\//g, '_')}-${size}.png`;
        await page.screenshot({ path: file, fullPage: process.env.LOOK_FULL === '1' });
        console.log(file);
      }
      if (errors.length) console.log(`${size} page errors:\n  ${errors.join('\n  ')}`);
    } finally {
      await browser.close();
    }
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
