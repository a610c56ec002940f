// Browser-test helpers for the canvas app, on the generic harness of tests/e2e/browser.ts: open the app,
// save screenshots, and read the app's state through window.__ninefold.
import { mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { browserHarnessStart, E2E_ROOT, E2E_SHOTS, type BrowserHarness } from './browser.ts';

export const ROOT = E2E_ROOT;
export const SHOTS = E2E_SHOTS;
export const SCREENS = resolve(ROOT, 'tests/e2e/screens');

export type Harness = BrowserHarness;

/** The generic harness (tests/e2e/browser.ts), with the folder of the README's images made. */
export async function harnessStart(): Promise<Harness> {
  mkdirSync(SCREENS, { recursive: true });
  return browserHarnessStart();
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
