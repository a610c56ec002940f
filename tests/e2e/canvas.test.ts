// The canvas app in headless Chromium: the walk-throughs, each with screenshots under
// test-output/e2e/ (a few also kept as README images in tests/e2e/screens/). Expected values were worked
// by hand on curves of our own (see tests/unit/construct/evaluate.test.ts for the chord arithmetic).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  clickWorld, harnessStart, labels, notice, objectCount, pageErrors, pageOpen, settle, shot, typeCurve, valueOf, worldToPage, type Harness,
} from './canvas-helpers.ts';

let h: Harness;

beforeAll(async () => {
  h = await harnessStart();
}, 120_000);

afterAll(async () => {
  await h?.close();
});

const E = 'y^2 = x^3 - 4x + 4'; // smooth; small points (0, ±2), (1, ±1), (2, ±2), (-2, ±2)

async function tool(page: Page, id: string): Promise<void> {
  await page.locator(`nf-rail button[data-tool="${id}"]`).click();
}

async function selectInList(page: Page, label: string, shift = false): Promise<void> {
  const li = page.locator(`nf-objects li[data-label="${label}"]`);
  await li.click({ modifiers: shift ? ['Shift'] : [] });
}

async function withPage(fn: (page: Page) => Promise<void>, width = 1280, height = 800): Promise<void> {
  const page = await pageOpen(h, width, height);
  try {
    await fn(page);
    expect(pageErrors(page)).toEqual([]);
  } finally {
    await page.context().close();
  }
}

describe('canvas app (e2e)', () => {
  it('types a smooth cubic, puts rational points on it, builds P+Q with a non-flex base point and checks it', async () => {
    await withPage(async (page) => {
      expect(await page.evaluate(() => document.querySelector('nf-app')?.shadowRoot?.querySelector('nf-canvas')?.shadowRoot?.querySelector('canvas') !== null)).toBe(true);
      await typeCurve(page, E);
      await shot(page, '01-curve');
      expect(await page.locator('nf-curve-panel dl').textContent()).toContain('Smooth');
      await tool(page, 'on-curve');
      await clickWorld(page, 0.03, 2.02); // snaps to (0, 2): its tangent y = 2 - x meets again at (1, 1), so not a flex
      await clickWorld(page, 1.02, 0.97);
      await clickWorld(page, 2.02, 2.03);
      const [o, p, q] = (await labels(page)).slice(1);
      expect((await valueOf(page, o))?.exact).toEqual(['0', '2', '1']);
      expect((await valueOf(page, p))?.exact).toEqual(['1', '1', '1']);
      expect((await valueOf(page, q))?.exact).toEqual(['2', '2', '1']);
      await tool(page, 'sum');
      await clickWorld(page, 0, 2);
      await clickWorld(page, 1, 1);
      await clickWorld(page, 2, 2);
      const s = (await labels(page))[4];
      // P*Q = (-2, -2) on y = x; O*(-2, -2) on y = 2x + 2 gives x = 6, y = 14.
      expect(await valueOf(page, s)).toMatchObject({ type: 'point', status: 'exact', exact: ['6', '14', '1'] });
      await page.evaluate(() => (window as unknown as { __ninefold: { setView(a: number, b: number, c: number): void } }).__ninefold.setView(2.5, 5, 38));
      await selectInList(page, s);
      await page.locator('nf-verify button[data-check="check-on-curve"]').click();
      const checks = await page.locator('nf-verify li').allTextContents();
      expect(checks.join(' ')).toMatch(/lies on E1/);
      expect(checks.join(' ')).toMatch(/holds/);
      expect(await page.locator('nf-inspector .exact-value').textContent()).toContain('(6, 14)');
      await shot(page, '02-sum-with-base-point', true);
    });
  }, 90_000);

  it('drags a free point: the line through it follows (approximate), and is exact again after the drop', async () => {
    await withPage(async (page) => {
      await tool(page, 'point');
      await clickWorld(page, 1, 1);
      await clickWorld(page, 3, 2);
      await tool(page, 'line');
      await clickWorld(page, 1, 1);
      await clickWorld(page, 3, 2);
      const [a, , l] = await labels(page);
      expect((await valueOf(page, l))?.status).toBe('exact');
      await tool(page, 'move');
      const [x0, y0] = await worldToPage(page, 1, 1);
      const [x1, y1] = await worldToPage(page, 2, -1);
      await page.mouse.move(x0, y0);
      await page.mouse.down();
      for (let k = 1; k <= 10; k++) await page.mouse.move(x0 + ((x1 - x0) * k) / 10, y0 + ((y1 - y0) * k) / 10);
      expect((await valueOf(page, l))?.status).toBe('approximate');
      expect((await valueOf(page, a))?.status).toBe('approximate');
      await shot(page, '03-drag-in-progress');
      await page.mouse.up();
      await settle(page);
      expect((await valueOf(page, a))?.exact).toEqual(['2', '-1', '1']);
      // The line through (2, -1) and (3, 2): 3x - y - 7 = 0.
      expect(await valueOf(page, l)).toMatchObject({ status: 'exact', exact: ['3', '-1', '-7'] });
      await shot(page, '04-after-drop');
    });
  }, 90_000);

  it('builds the ninth point of eight points and verifies the nine-point check', async () => {
    await withPage(async (page) => {
      await typeCurve(page, E);
      await tool(page, 'on-curve');
      const pts: [number, number][] = [[0, 2], [0, -2], [1, 1], [1, -1], [2, 2], [2, -2], [-2, 2], [-2, -2]];
      for (const [x, y] of pts) await clickWorld(page, x + 0.01, y + 0.01);
      expect(await objectCount(page)).toBe(9);
      await tool(page, 'ninth');
      for (const [x, y] of pts) await clickWorld(page, x, y);
      const all = await labels(page);
      const n = all[all.length - 1];
      expect((await valueOf(page, n))?.status).toBe('exact');
      for (const [i, lab] of all.slice(1).entries()) await selectInList(page, lab, i > 0);
      await page.locator('nf-verify button[data-check="check-nine"]').click();
      await selectInList(page, n);
      await page.locator('nf-verify button[data-check="check-on-curve"]').click();
      const text = (await page.locator('nf-verify ul').textContent()) ?? '';
      // Cayley–Bacharach: E passes through the eight, so through the ninth base point too.
      expect(text).toMatch(/base points of a pencil of cubics/);
      expect((await page.locator('nf-verify .verdict').allTextContents()).every((v) => v.trim() === 'holds')).toBe(true);
      await shot(page, '05-ninth-point', true);
    });
  }, 90_000);

  it('opens a nodal cubic, reads its singular point and moves the blow-up parameter', async () => {
    await withPage(async (page) => {
      await typeCurve(page, 'y^2 = x^3 - 3x + 2'); // (x - 1)^2 (x + 2): a node at (1, 0), tangents y = ±√3 (x - 1)
      await page.locator('nf-app summary', { hasText: 'Singular point' }).click();
      const sing = (await page.locator('nf-blowup .singular').first().textContent()) ?? '';
      expect(sing).toMatch(/node/);
      expect(sing).toMatch(/1:0:1/);
      await page.locator('nf-blowup button', { hasText: 'Show blow-up lines' }).click();
      const before = await page.locator('nf-blowup .param-point').textContent();
      const slider = page.locator('nf-blowup input[type="range"]');
      await slider.focus();
      for (let k = 0; k < 12; k++) await slider.press('ArrowRight');
      await settle(page);
      const after = await page.locator('nf-blowup .param-point').textContent();
      expect(after).not.toBe(before);
      expect(await page.locator('nf-blowup .over').textContent()).toMatch(/not rational/); // the tangents are conjugate over Q
      await shot(page, '06-blow-up', true);
      await page.locator('nf-blowup button', { hasText: 'Place this point' }).click();
      const all = await labels(page);
      expect((await valueOf(page, all[all.length - 1]))?.status).toBe('exact');
    });
  }, 90_000);

  it('runs a point search, cancels a long one, and lists a finished one', async () => {
    await withPage(async (page) => {
      await typeCurve(page, E);
      await page.locator('nf-app summary', { hasText: 'Rational points' }).click();
      const height = page.locator('nf-search input.h');
      await height.fill('4000');
      await page.locator('nf-search button.start').click();
      await page.locator('nf-search progress').waitFor({ timeout: 10_000 });
      await shot(page, '07-search-running');
      await page.locator('nf-search button.cancel').click();
      await page.waitForFunction(() => (window as unknown as { __ninefold: { search(): { phase: string } } }).__ninefold.search().phase === 'cancelled');
      expect(await notice(page)).toMatch(/cancelled/i);
      await height.fill('30');
      await page.locator('nf-search button.start').click();
      await page.waitForFunction(() => (window as unknown as { __ninefold: { search(): { phase: string } } }).__ninefold.search().phase === 'done', undefined, { timeout: 30_000 });
      const rows = await page.locator('nf-search tbody tr').count();
      expect(rows).toBeGreaterThanOrEqual(9); // (0:1:0) and the eight small affine points at least
      await shot(page, '08-search-done', true);
      // A region drawn on the canvas around x in [0.5, 2.5], y in [0.5, 2.5] keeps (1, 1) and (2, 2) only.
      await page.locator('nf-search button', { hasText: 'Draw region' }).click();
      const [rx0, ry0] = await worldToPage(page, 0.5, 2.5);
      const [rx1, ry1] = await worldToPage(page, 2.5, 0.5);
      await page.mouse.move(rx0, ry0);
      await page.mouse.down();
      await page.mouse.move(rx1, ry1, { steps: 5 });
      await page.mouse.up();
      await page.locator('nf-search button.start').click();
      await page.waitForFunction(() => (window as unknown as { __ninefold: { search(): { phase: string } } }).__ninefold.search().phase === 'done', undefined, { timeout: 30_000 });
      const inside = await page.evaluate(() => (window as unknown as { __ninefold: { search(): { points: string[] } } }).__ninefold.search().points);
      expect(inside.length).toBeGreaterThanOrEqual(2);
      expect(inside).toEqual(expect.arrayContaining(['1:1:1', '2:2:1']));
      for (const q of inside) {
        const [x, y, z] = q.split(':').map(Number);
        expect(x / z >= 0.5 && x / z <= 2.5 && y / z >= 0.5 && y / z <= 2.5).toBe(true);
      }
      await shot(page, '08a-search-region');
    });
  }, 90_000);

  it('undoes and redoes, and restores the construction after a reload', async () => {
    await withPage(async (page) => {
      await typeCurve(page, E);
      await tool(page, 'on-curve');
      await clickWorld(page, 1.01, 1.01);
      await clickWorld(page, 2.01, 2.01);
      await tool(page, 'line');
      await clickWorld(page, 1, 1);
      await clickWorld(page, 2, 2);
      expect(await objectCount(page)).toBe(4);
      await page.getByRole('button', { name: 'Undo' }).click();
      expect(await objectCount(page)).toBe(3);
      await page.getByRole('button', { name: 'Undo' }).click();
      expect(await objectCount(page)).toBe(2);
      await page.getByRole('button', { name: 'Redo' }).click();
      await page.getByRole('button', { name: 'Redo' }).click();
      expect(await objectCount(page)).toBe(4);
      // Deleting a point with a line built from it asks first, naming the dependents.
      const [, a] = await labels(page);
      await selectInList(page, a);
      await page.locator('nf-objects button', { hasText: 'Delete selected' }).click();
      expect(await page.locator('nf-objects .confirm').textContent()).toMatch(/Delete A and the 1 object built from it \(l1\)/);
      await shot(page, '09a-delete-asks');
      await page.locator('nf-objects .confirm button.no').click();
      expect(await objectCount(page)).toBe(4);
      await page.locator('nf-objects button', { hasText: 'Delete selected' }).click();
      await page.locator('nf-objects .confirm button.yes').click();
      expect(await objectCount(page)).toBe(2);
      await page.getByRole('button', { name: 'Undo' }).click();
      expect(await objectCount(page)).toBe(4);
      await page.waitForTimeout(400); // the autosave runs 150 ms after a change
      await page.reload();
      await page.waitForFunction(() => (window as unknown as { __ninefold?: { frames(): number[] } }).__ninefold?.frames().length);
      expect(await objectCount(page)).toBe(4);
      expect(await notice(page)).toMatch(/Restored/);
      await shot(page, '09-restored');
    });
  }, 90_000);

  it('marks a bad equation at its column and explains a wrong-tool click; the canvas keeps drawing', async () => {
    await withPage(async (page) => {
      await typeCurve(page, 'y^2 = x^^3 + 1');
      const err = (await page.locator('nf-curve-panel .error').textContent()) ?? '';
      expect(err).toMatch(/At column \d+/);
      expect(await page.locator('nf-curve-panel input.eq').getAttribute('aria-invalid')).toBe('true');
      await shot(page, '10-bad-equation');
      await tool(page, 'point');
      await clickWorld(page, -1, 0);
      await clickWorld(page, 1, 1);
      await tool(page, 'line');
      await clickWorld(page, -1, 0);
      await clickWorld(page, 1, 1);
      await tool(page, 'tangent');
      await clickWorld(page, 0, 0.5); // on the line y = (x + 1)/2
      expect(await notice(page)).toMatch(/Tangent needs a point here \(the point of tangency\), but l1 is a line/);
      const frames = await page.evaluate(() => (window as unknown as { __ninefold: { frames(): number[] } }).__ninefold.frames().length);
      expect(frames).toBeGreaterThan(3);
      await shot(page, '11-wrong-tool');
    });
  }, 90_000);

  it('meets two curves in the background worker and shows every real meet point (rational ones exactly)', async () => {
    await withPage(async (page) => {
      await typeCurve(page, E);
      await typeCurve(page, 'x^2 + y^2 = 8'); // meets E at (2, ±2) and (-2, ±2) among others
      await tool(page, 'meet');
      await clickWorld(page, 2 * Math.SQRT2, 0); // on the circle
      await clickWorld(page, -2.3830, 0); // E crosses y = 0 near x = -2.383
      expect(await notice(page)).not.toMatch(/needs/);
      await page.waitForFunction(() => {
        const h = (window as unknown as { __ninefold: { doc(): { objects: { id: string; construction: { kind: string } }[] }; value(id: string): { type: string; status?: string } } }).__ninefold;
        const meets = h.doc().objects.filter((o) => o.construction.kind === 'point-meet');
        return meets.length > 0 && meets.every((o) => h.value(o.id).type === 'point');
      }, undefined, { timeout: 30_000 });
      const exact = await page.evaluate(() => {
        const h = (window as unknown as { __ninefold: { doc(): { objects: { id: string; construction: { kind: string } }[] }; value(id: string): { exact?: string[] } } }).__ninefold;
        return h.doc().objects.filter((o) => o.construction.kind === 'point-meet').map((o) => h.value(o.id).exact?.join(':'));
      });
      expect(exact).toEqual(expect.arrayContaining(['2:2:1', '2:-2:1', '2:2:-1', '2:-2:-1']));
      await shot(page, '13-curve-meet', true);
    });
  }, 90_000);

  it('fits the sidebar without overlap at 1920x1080', async () => {
    await withPage(async (page) => {
      await typeCurve(page, E);
      await shot(page, '12-wide');
    }, 1920, 1080);
  }, 60_000);

  // The side bar as a visitor first sees it (the default demo scene open, its Scene panel at the top), at
  // a laptop and a desktop size: no control or text sticks out of the side bar or is cut off, and every
  // control can be named. The screenshots are looked at by hand as well.
  for (const [w, hgt] of [[1280, 800], [1920, 1080]] as const) {
    it(`shows the side bar at ${w}x${hgt} with nothing overflowing, clipped or unlabelled`, async () => {
      const context = await h.browser.newContext({ viewport: { width: w, height: hgt } });
      const page = await context.newPage();
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      try {
        await page.goto(h.url, { timeout: 60_000 });
        await page.waitForFunction(() => (window as any).__ninefold?.doc()?.objects?.length > 0, null, { timeout: 60_000 });
        await page.locator('nf-scene-file').waitFor();
        await settle(page);
        await shot(page, `14-sidebar-${w}x${hgt}`);
        const sideBarFaults = () => page.evaluate(() => {
          const app = document.querySelector('nf-app')!;
          const aside = app.shadowRoot!.querySelector('aside')!;
          const box = aside.getBoundingClientRect();
          const out: string[] = [];
          const walk = (root: ParentNode) => {
            for (const el of root.querySelectorAll('*')) {
              const e = el as HTMLElement;
              if (e.shadowRoot) walk(e.shadowRoot);
              const r = e.getBoundingClientRect();
              if (r.width === 0 || r.height === 0 || getComputedStyle(e).visibility === 'hidden') continue;
              const name = `${e.localName}${e.className ? '.' + String(e.className).replace(/\s+/g, '.') : ''} "${(e.textContent ?? '').trim().slice(0, 30)}"`;
              if (r.left < box.left - 0.5 || r.right > box.right - aside.offsetWidth + aside.clientWidth + 0.5) out.push(`outside the side bar: ${name} (${Math.round(r.left)}..${Math.round(r.right)} of ${Math.round(box.left)}..${Math.round(box.right)})`);
              const control = ['input', 'select', 'button', 'textarea'].includes(e.localName);
              if (control && e.scrollWidth > e.clientWidth + 1 && e.localName !== 'textarea' && e.localName !== 'input') out.push(`text cut off in ${name}`);
              if (control && (e as HTMLInputElement).type !== 'file') {
                const labelled = e.getAttribute('aria-label') || (e.textContent ?? '').trim() || e.closest('label') || e.getAttribute('title') || ((e as HTMLInputElement).id && root.querySelector(`label[for="${(e as HTMLInputElement).id}"]`));
                if (!labelled) out.push(`no name for ${name}`);
              }
            }
          };
          walk(aside);
          if (aside.scrollWidth > aside.clientWidth + 1) out.push(`the side bar scrolls sideways (${aside.scrollWidth} > ${aside.clientWidth})`);
          return out;
        });
        expect(await sideBarFaults(), 'as it opens').toEqual([]);
        // Every folding section open (figure export, trials, notes, blow-up, ...): still nothing sticks out.
        await page.evaluate(() => {
          const open = (root: ParentNode) => {
            for (const el of root.querySelectorAll('*')) {
              if (el.localName === 'details') (el as HTMLDetailsElement).open = true;
              if ((el as HTMLElement).shadowRoot) open((el as HTMLElement).shadowRoot!);
            }
          };
          open(document.querySelector('nf-app')!.shadowRoot!);
        });
        await settle(page);
        await shot(page, `14-sidebar-${w}x${hgt}-open`);
        const scroll = async (to: number) => {
          await page.evaluate((t) => {
            const aside = document.querySelector('nf-app')!.shadowRoot!.querySelector('aside')!;
            aside.scrollTop = t * aside.scrollHeight;
          }, to);
          await settle(page);
        };
        for (const at of [0.3, 0.6]) {
          await scroll(at);
          await shot(page, `14-sidebar-${w}x${hgt}-open-${Math.round(at * 10)}`);
        }
        await scroll(1);
        await shot(page, `14-sidebar-${w}x${hgt}-open-end`);
        expect(await sideBarFaults(), 'with every section open').toEqual([]);
        expect(errors).toEqual([]);
      } finally {
        await context.close();
      }
    }, 90_000);
  }
  it('a reset page forgets the demo scene\'s title and notes', async () => {
    await withPage(async (page) => {
      expect(await page.locator('nf-scene-file input.title').inputValue()).toBe('Untitled scene');
      await page.locator('nf-scene-file details.notes summary').click();
      expect(await page.locator('nf-scene-file textarea').inputValue()).toBe('');
    });
  }, 60_000);
});
