// A small browser harness others can reuse: vite's dev server on 127.0.0.1 at a free port, headless
// Debian Chromium through playwright-core with the project's flags, screenshots under test-output/e2e/.
// Always close in `finally` (the harness closes the browser, then the server).
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createServer, type ViteDevServer } from 'vite';
import { chromium, type Browser, type Page } from 'playwright-core';

export const E2E_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const E2E_SHOTS = resolve(E2E_ROOT, 'test-output/e2e');

export const CHROMIUM_FLAGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking',
  '--disable-component-update', '--disable-sync', '--no-first-run',
];

export interface BrowserHarness {
  readonly server: ViteDevServer;
  readonly browser: Browser;
  /** Base address, ending in "/". */
  readonly url: string;
  close(): Promise<void>;
}

export async function browserHarnessStart(): Promise<BrowserHarness> {
  mkdirSync(E2E_SHOTS, { recursive: true });
  const server = await createServer({
    root: E2E_ROOT, logLevel: 'error', server: { host: '127.0.0.1', port: 0, strictPort: false, hmr: false },
  });
  await server.listen();
  const addr = server.httpServer?.address();
  if (!addr || typeof addr !== 'object') {
    await server.close();
    throw new Error('vite did not report the port it listens on');
  }
  let browser: Browser;
  try {
    browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_FLAGS, timeout: 60_000 });
  } catch (e) {
    await server.close();
    throw e;
  }
  return {
    server,
    browser,
    url: `http://127.0.0.1:${addr.port}/`,
    async close() {
      try {
        await browser.close();
      } finally {
        await server.close();
      }
    },
  };
}

/** Open a path of the served site in a fresh context; page errors are collected in `errors`. */
export async function browserPageOpen(h: BrowserHarness, path: string, width = 1100, height = 760): Promise<{ page: Page; errors: string[] }> {
  const context = await h.browser.newContext({ viewport: { width, height } });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  // A failed load is reported by its address (the console line does not name it); the browser's own
  // favicon request is not the page's.
  page.on('console', (m) => {
    if (m.type() === 'error' && !m.text().startsWith('Failed to load resource')) errors.push(m.text());
  });
  page.on('response', (r) => {
    if (r.status() >= 400 && !r.url().endsWith('/favicon.ico')) errors.push(`${r.status()} for ${r.url()}`);
  });
  await page.goto(h.url + path.replace(/^\//, ''), { timeout: 60_000 });
  return { page, errors };
}

export function shotPath(name: string): string {
  return resolve(E2E_SHOTS, `${name}.png`);
}
