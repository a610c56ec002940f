// Browser-test helpers for the canvas app: serve the page with vite on 127.0.0.1, drive headless Debian
// Chromium through playwright-core, save screenshots, and read the app's state through window.__ninefold.
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createServer, type ViteDevServer } from 'vite';
import { chromium, type Browser, type Page } from 'playwright-core';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const SHOTS = resolve(ROOT, 'test-output/e2e');
export const SCREENS = resolve(ROOT, 'tests/e2e/screens');

export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export interface Harness {
  readonly server: ViteDevServer;
  readonly browser: Browser;
  readonly url: string;
  close(): Promise<void>;
}

export async function harnessStart(): Promise<Harness> {
  mkdirSync(SHOTS, { recursive: true });
  mkdirSync(SCREENS, { recursive: true });
  const server = await createServer({ root: ROOT, logLevel: 'error', server: { host: '127.0.0.1', port: 0, strictPort: false, hmr: false } });
  await server.listen();
  const addr = server.httpServer?.address();
  const port = typeof addr === 'object' && addr ? addr.port : 5173;
  let browser: Browser;
  try {
    browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS, timeout: 60_000 });
  } catch (e) {
    await server.close();
    throw e;
  }
  return {
    server,
    browser,
    url: `http://127.0.0.1:${port}/`,
    async close() {
      try {
        await browser.close();
      } finally {
        await server.close();
      }
    },
  };
}

/** A fresh page (its own storage) at the given size, with the app loaded and the canvas drawn. */
export async function pageOpen(h: Harness, width = 1280, height = 800): Promise<Page> {
  const context = await h.browser.newContext({ viewport: { width, height } });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  (page as unknown as { errors: string[] }).errors = errors;
  await page.goto(h.url, { timeout: 60_000 });
  await appReady(page);
  // The page opens a demo scene on a first visit; these tests start from nothing.
  await page.waitForTimeout(50);
  await page.evaluate(() => (window as unknown as { __ninefold: { reset(): void } }).__ninefold.reset());
  await settle(page);
  return page;
}

export async function appReady(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const w = window as unknown as { __ninefold?: { frames(): number[] } };
    return !!w.__ninefold && w.__ninefold.frames().length > 0;
  }, undefined, { timeout: 60_000 });
}

export function pageErrors(page: Page): string[] {
  return (page as unknown as { errors: string[] }).errors;
}

export async function shot(page: Page, name: string, alsoScreen = false): Promise<void> {
  await settle(page);
  await page.screenshot({ path: resolve(SHOTS, `${name}.png`) });
  // The README's images are refreshed only on request (NINEFOLD_SCREENS=1), so a test run leaves the
  // checkout as it found it.
  if (alsoScreen && process.env.NINEFOLD_SCREENS === '1') await page.screenshot({ path: resolve(SCREENS, `${name}.png`) });
}

/** Wait for two animation frames so the canvas shows the latest state. */
export async function settle(page: Page): Promise<void> {
  await page.evaluate(() => new Promise<void>((r) => requestAnimationFrame(() => requestAnimationFrame(() => r()))));
}

export async function worldToPage(page: Page, x: number, y: number): Promise<[number, number]> {
  const p = await page.evaluate(([a, b]) => (window as unknown as { __ninefold: { worldToPage(x: number, y: number): [number, number] } }).__ninefold.worldToPage(a, b), [x, y]);
  return p;
}

export async function clickWorld(page: Page, x: number, y: number, opts: { shift?: boolean } = {}): Promise<void> {
  const [px, py] = await worldToPage(page, x, y);
  if (opts.shift) await page.keyboard.down('Shift');
  await page.mouse.click(px, py);
  if (opts.shift) await page.keyboard.up('Shift');
  await settle(page);
}

export interface HookValue {
  type: string;
  status?: string;
  exact?: string[];
  approx?: { x: number; y: number; finite: boolean } | number[];
  verdict?: string;
  certificate?: string;
  message?: string;
  claim?: string;
}

export async function valueOf(page: Page, label: string): Promise<HookValue | null> {
  return page.evaluate((l) => {
    const h = (window as unknown as { __ninefold: { idOf(l: string): string | null; value(id: string): unknown } }).__ninefold;
    const id = h.idOf(l);
    return id ? (h.value(id) as never) : null;
  }, label);
}

export async function objectCount(page: Page): Promise<number> {
  return page.evaluate(() => (window as unknown as { __ninefold: { doc(): { objects: unknown[] } } }).__ninefold.doc().objects.length);
}

export async function labels(page: Page): Promise<string[]> {
  return page.evaluate(() => (window as unknown as { __ninefold: { doc(): { objects: { label: string; helperOf?: string }[] } } }).__ninefold.doc().objects.filter((o) => !o.helperOf).map((o) => o.label));
}

export async function typeCurve(page: Page, equation: string): Promise<void> {
  const eq = page.locator('nf-curve-panel input.eq');
  await eq.fill(equation);
  await eq.press('Enter');
  await settle(page);
}

export async function notice(page: Page): Promise<string> {
  return (await page.locator('nf-app .notice').textContent()) ?? '';
}
