// Styles and typed lines in the page (headless Chromium): restyle a curve in the Inspect panel (colour,
// dash, width, label hidden), undo it step by step, type a line by its coefficients and by its equation,
// and a bad line with its message in place. Screenshots under test-output/e2e/ (style-*.png).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { harnessStart, labels, pageErrors, pageOpen, shot, settle, typeCurve, type Harness } from './canvas-helpers.ts';

let h: Harness;

beforeAll(async () => {
  h = await harnessStart();
}, 120_000);

afterAll(async () => {
  await h?.close();
});

interface Obj { id: string; label: string; type: string; style: { colour: string; stroke?: string; width?: number; visible: boolean; showLabel: boolean }; construction: { kind: string; params: Record<string, string> } }

async function objectNamed(page: Page, label: string): Promise<Obj | undefined> {
  return page.evaluate((l) => (window as unknown as { __ninefold: { doc(): { objects: Obj[] } } }).__ninefold.doc().objects.find((o) => o.label === l), label);
}

async function withPage(fn: (page: Page) => Promise<void>): Promise<void> {
  const page = await pageOpen(h, 1280, 800);
  try {
    await fn(page);
    expect(pageErrors(page)).toEqual([]);
  } finally {
    await page.context().close();
  }
}

/** No two text boxes of the sidebar's Inspect and Curve panels overlap (each leaf text element's box). */
async function sidebarOverlaps(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const boxes: { t: string; r: DOMRect }[] = [];
    const walk = (root: Element | ShadowRoot) => {
      for (const el of Array.from(root.querySelectorAll('*'))) {
        if (el.shadowRoot) walk(el.shadowRoot);
        const own = Array.from(el.childNodes).some((n) => n.nodeType === 3 && (n.textContent ?? '').trim() !== '');
        const r = el.getBoundingClientRect();
        if ((own || el.matches('input, select, button')) && r.width > 0 && r.height > 0) boxes.push({ t: `${el.tagName}:${(el.textContent ?? '').trim().slice(0, 20)}`, r });
      }
    };
    for (const tag of ['nf-inspector', 'nf-curve-panel']) {
      const el = document.querySelector('nf-app')?.shadowRoot?.querySelector(tag);
      if (el?.shadowRoot) walk(el.shadowRoot);
    }
    // Guard against a check that cannot fail: the panels hold dozens of text boxes.
    if (boxes.length < 20) return [`only ${boxes.length} text boxes found`];
    const bad: string[] = [];
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i].r;
        const b = boxes[j].r;
        const overlap = Math.min(a.right, b.right) - Math.max(a.left, b.left) > 1 && Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top) > 1;
        const nested = (a.left <= b.left && a.right >= b.right && a.top <= b.top && a.bottom >= b.bottom) || (b.left <= a.left && b.right >= a.right && b.top <= a.top && b.bottom >= a.bottom);
        if (overlap && !nested) bad.push(`${boxes[i].t} / ${boxes[j].t}`);
      }
    }
    return bad;
  });
}

describe('styles and typed lines (e2e)', () => {
  it('restyles a curve (colour, dash, width, label) one undo step each, and undoes it', async () => {
    await withPage(async (page) => {
      await typeCurve(page, 'y^2 = x^3 - 3x + 3');
      const label = (await labels(page))[0];
      await page.locator(`nf-objects li[data-label="${label}"]`).click();
      const before = (await objectNamed(page, label))!;
      expect(before.style).toMatchObject({ stroke: 'solid', showLabel: true, visible: true });

      await page.locator('nf-inspector button[data-colour="#7a1f3d"]').click();
      await expect.poll(async () => (await objectNamed(page, label))?.style.colour).toBe('#7a1f3d');
      expect(await page.locator('nf-inspector button[data-colour="#7a1f3d"]').getAttribute('aria-pressed')).toBe('true');
      await page.locator('nf-inspector select#stroke').selectOption('dashed');
      await page.locator('nf-inspector select#width').selectOption('3');
      await page.locator('nf-inspector input[name="showLabel"]').uncheck();
      await settle(page);
      expect((await objectNamed(page, label))!.style).toMatchObject({ colour: '#7a1f3d', stroke: 'dashed', width: 3, showLabel: false, visible: true });
      await shot(page, 'style-01-curve-restyled');
      expect(await sidebarOverlaps(page)).toEqual([]);

      // Keyboard: the swatches are buttons in the tab order, so Enter on a focused one picks it.
      await page.locator('nf-inspector button[data-colour="#3fa3a0"]').focus();
      await page.keyboard.press('Enter');
      await expect.poll(async () => (await objectNamed(page, label))?.style.colour).toBe('#3fa3a0');

      // Five changes, five undo steps, in reverse order.
      const undo = page.locator('nf-app button[aria-label="Undo"]');
      await undo.click();
      expect((await objectNamed(page, label))!.style).toMatchObject({ colour: '#7a1f3d', showLabel: false });
      await undo.click();
      expect((await objectNamed(page, label))!.style).toMatchObject({ showLabel: true, width: 3 });
      await undo.click();
      await undo.click();
      await undo.click();
      expect((await objectNamed(page, label))!.style).toEqual(before.style);
      // The inspector shows the restored style.
      expect(await page.locator('nf-inspector select#stroke').inputValue()).toBe('solid');
      expect(await page.locator('nf-inspector input[name="showLabel"]').isChecked()).toBe(true);
      await shot(page, 'style-02-undone');
    });
  }, 90_000);

  it('types lines by coefficients and by equation, hides one, and refuses a bad line in place', async () => {
    await withPage(async (page) => {
      await typeCurve(page, 'y^2 = x^3 - 3x + 3');
      const box = page.locator('nf-curve-panel input.ln');
      await box.fill('1:-2:1/2');
      await box.press('Enter');
      await settle(page);
      const lines = async () => page.evaluate(() => (window as unknown as { __ninefold: { doc(): { objects: Obj[] } } }).__ninefold.doc().objects.filter((o) => o.type === 'line'));
      let ls = await lines();
      expect(ls.map((l) => [l.construction.kind, l.construction.params.at])).toEqual([['line-equation', '2:-4:1']]);
      expect(await box.inputValue()).toBe('');

      await box.fill('3y = 2x - 1/3');
      await box.press('Enter');
      await settle(page);
      ls = await lines();
      expect(ls[1].construction.params.at).toBe('6:-9:-1'); // 2x - 3y - 1/3 = 0, times 3
      // The new line is selected, so the inspector restyles it straight away.
      await page.locator('nf-inspector select#stroke').selectOption('dotted');
      expect((await lines())[1].style.stroke).toBe('dotted');
      await page.locator('nf-inspector input[name="visible"]').uncheck();
      expect((await lines())[1].style.visible).toBe(false);
      await shot(page, 'style-03-typed-lines');

      await box.fill('y = x^2 + 1');
      await box.press('Enter');
      await settle(page);
      const msg = page.locator('nf-curve-panel .line-error');
      expect(await msg.textContent()).toMatch(/not a line: this equation has degree 2/);
      expect(await box.getAttribute('aria-invalid')).toBe('true');
      await box.fill('2x + * 3 = 0');
      await box.press('Enter');
      await settle(page);
      expect(await msg.textContent()).toMatch(/^At column 6:/);
      await box.fill('1:2');
      await box.press('Enter');
      await settle(page);
      expect(await msg.textContent()).toMatch(/three coefficients a:b:c/);
      await box.fill('0:0:0');
      await box.press('Enter');
      await settle(page);
      expect(await msg.textContent()).toMatch(/coefficients are zero, and 0:0:0 is no line/);
      expect((await lines()).length).toBe(2);
      await shot(page, 'style-04-bad-line');
      expect(await sidebarOverlaps(page)).toEqual([]);
      await box.fill('x');
      expect(await msg.count()).toBe(0); // typing clears the message
    });
  }, 90_000);
});
