// The curve viewer in headless Chromium: it draws with Pixi's canvas renderer (checked, not assumed),
// shows the report of the default curve, keeps the last good curve when the text does not read, and pans
// and zooms by mouse and wheel. Screenshots go to test-output/e2e/viewer-*.png.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserHarnessStart, browserPageOpen, shotPath, type BrowserHarness } from './browser.ts';

const PAGE = 'src/ui/viewer/index.html';
let h: BrowserHarness;
let page: Page;
let errors: string[];

const data = (p: Page): Promise<Record<string, string>> =>
  p.evaluate(() => ({ ...(document.querySelector('.nf-viewer') as HTMLElement).dataset }) as Record<string, string>);

// Pixels of the curve's ink (#1d3f5e, anti-aliased) on the canvas, read back from the canvas itself.
const inkPixels = (p: Page): Promise<number> =>
  p.evaluate(() => {
    const c = document.querySelector('.nf-stage canvas') as HTMLCanvasElement;
    const copy = document.createElement('canvas');
    copy.width = c.width;
    copy.height = c.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(c, 0, 0);
    const d = ctx.getImageData(0, 0, c.width, c.height).data;
    let n = 0;
    for (let i = 0; i < d.length; i += 4) if (d[i] < 90 && d[i + 1] < 110 && d[i + 2] > 60 && d[i + 2] < 150) n++;
    return n;
  });

describe('curve viewer (e2e)', () => {
  beforeAll(async () => {
    h = await browserHarnessStart();
    ({ page, errors } = await browserPageOpen(h, PAGE));
    await page.waitForFunction(() => (document.querySelector('.nf-viewer') as HTMLElement | null)?.dataset.pieces !== undefined, undefined, { timeout: 60_000 });
  }, 120_000);

  afterAll(async () => {
    await h?.close();
  });

  it('draws the default curve with the canvas renderer and reports it', async () => {
    const d = await data(page);
    expect(d.renderer).toBe('canvas');
    expect(d.degree).toBe('3');
    expect(d.equation).toContain('y^2');
    // 2y^2 - xy = x^3 - 4x + 1 in the opening view: an oval and an unbounded branch.
    expect(d.pieces).toBe('2');
    expect(await inkPixels(page)).toBeGreaterThan(500);
    await page.screenshot({ path: shotPath('viewer-default') });
    expect(errors, errors.join("\n")).toEqual([]);
  });

  it('pans with a mouse drag', async () => {
    const before = (await data(page)).view.split(',').map(Number);
    const box = (await page.locator('.nf-stage').boundingBox())!;
    await page.mouse.move(box.x + 300, box.y + 300);
    await page.mouse.down();
    await page.mouse.move(box.x + 400, box.y + 350, { steps: 5 });
    await page.mouse.up();
    await page.waitForTimeout(100);
    const after = (await data(page)).view.split(',').map(Number);
    expect(after[0]).toBeCloseTo(before[0] - 100 * before[2], 6);
    expect(after[1]).toBeCloseTo(before[1] + 50 * before[2], 6);
    await page.screenshot({ path: shotPath('viewer-panned') });
  });

  it('zooms about the cursor with the wheel', async () => {
    const before = (await data(page)).view.split(',').map(Number);
    const box = (await page.locator('.nf-stage').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -400);
    await page.waitForTimeout(150);
    const after = (await data(page)).view.split(',').map(Number);
    expect(after[2]).toBeLessThan(before[2] * 0.8);
    await page.screenshot({ path: shotPath('viewer-zoomed') });
    await page.locator('button', { hasText: 'Recentre' }).click();
    await page.waitForTimeout(100);
  });

  it('zooms with a two-finger pinch and pans with one finger (touch)', async () => {
    const context = await h.browser.newContext({ viewport: { width: 900, height: 700 }, hasTouch: true });
    try {
      const touchPage = await context.newPage();
      await touchPage.goto(h.url + PAGE, { timeout: 60_000 });
      await touchPage.waitForFunction(() => (document.querySelector('.nf-viewer') as HTMLElement | null)?.dataset.pieces !== undefined, undefined, { timeout: 60_000 });
      const cdp = await context.newCDPSession(touchPage);
      const box = (await touchPage.locator('.nf-stage').boundingBox())!;
      const cx = box.x + box.width / 2;
      const cy = box.y + box.height / 2;
      const before = (await data(touchPage)).view.split(',').map(Number);
      const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', pts: [number, number][]): Promise<unknown> =>
        cdp.send('Input.dispatchTouchEvent', { type, touchPoints: pts.map(([x, y], id) => ({ x, y, id })) });
      await touch('touchStart', [[cx - 40, cy], [cx + 40, cy]]);
      for (let k = 1; k <= 8; k++) await touch('touchMove', [[cx - 40 - 10 * k, cy], [cx + 40 + 10 * k, cy]]);
      await touch('touchEnd', []);
      await touchPage.waitForTimeout(150);
      const pinched = (await data(touchPage)).view.split(',').map(Number);
      // The fingers moved from 80 px apart to 240 px apart: three times closer in, about the midpoint.
      expect(pinched[2]).toBeCloseTo(before[2] / 3, 6);
      expect(pinched[0]).toBeCloseTo(before[0], 6);
      await touch('touchStart', [[cx, cy]]);
      for (let k = 1; k <= 5; k++) await touch('touchMove', [[cx + 12 * k, cy]]);
      await touch('touchEnd', []);
      await touchPage.waitForTimeout(150);
      const panned = (await data(touchPage)).view.split(',').map(Number);
      expect(panned[0]).toBeCloseTo(pinched[0] - 60 * pinched[2], 6);
      await touchPage.screenshot({ path: shotPath('viewer-touch') });
    } finally {
      await context.close();
    }
  });

  it('keeps the last good curve and says where a bad equation fails', async () => {
    const input = page.locator('#nf-equation');
    await input.fill('y^2 = x^3 +');
    await input.press('Enter');
    await page.waitForTimeout(100);
    const d = await data(page);
    expect(d.problem).toMatch(/expected a term/);
    expect(d.pieces).toBe('2');
    expect(await page.locator('.nf-problem').innerText()).toContain('column');
    expect(await inkPixels(page)).toBeGreaterThan(500);
    await page.screenshot({ path: shotPath('viewer-bad-equation') });
  });

  it('draws a new curve: a node shows its branch ends meeting', async () => {
    const input = page.locator('#nf-equation');
    await input.fill('y^2 = x^3 - 3x + 2');
    await input.press('Enter');
    await page.waitForTimeout(150);
    const d = await data(page);
    expect(d.problem).toBeUndefined();
    expect(d.pieces).toBe('3');
    await page.screenshot({ path: shotPath('viewer-node') });
    expect(errors, errors.join("\n")).toEqual([]);
  });
});
