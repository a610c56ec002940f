// The page's scene handling, driven in Chromium: the default demo scene at start, save (download) and
// reopen exactly, open by file picker and by drag-and-drop, every refusal named with its place and the
// open scene left as it was, hostile labels shown as text, figure export, theorem trials with cancel
// and a counterexample that opens.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { browserHarnessStart, type BrowserHarness } from './browser.ts';
import { sceneParse } from '../../src/scene/load.ts';
import { sceneToText } from '../../src/scene/save.ts';
import type { Scene } from '../../src/scene/scene.ts';
import { constructionAdd, constructionEmpty } from '../../src/construct/graph.ts';
import { rat } from '../../src/exact/rational.ts';

const demo = (f: string) => readFileSync(new URL(`../../scenes/${f}`, import.meta.url), 'utf8');
let harness: BrowserHarness;
let browser: Browser;
let base = '';

beforeAll(async () => {
  harness = await browserHarnessStart();
  browser = harness.browser;
  base = harness.url;
}, 120_000);

afterAll(async () => {
  await harness?.close();
});

async function fresh(): Promise<Page> {
  const page = await browser.newPage({ viewport: { width: 1500, height: 900 }, acceptDownloads: true });
  page.on('pageerror', (e) => {
    throw e;
  });
  await page.goto(base);
  await page.waitForFunction(() => (window as any).__ninefold?.doc()?.objects?.length > 0, null, { timeout: 60_000 });
  await page.locator('nf-scene-file').waitFor();
  return page;
}

const docOf = (page: Page) => page.evaluate(() => JSON.stringify((window as any).__ninefold.doc()));

async function openText(page: Page, name: string, text: string | Buffer): Promise<void> {
  const buffer = typeof text === 'string' ? Buffer.from(text) : text;
  if (buffer.length < 40 * 1024 * 1024) {
    await page.locator('nf-scene-file input[type=file]').setInputFiles({ name, mimeType: 'application/json', buffer });
    return;
  }
  // Large files go through the disk (the driver refuses buffers over 50 MB).
  const dir = mkdtempSync(join(tmpdir(), 'ninefold-e2e-'));
  try {
    writeFileSync(join(dir, name), buffer);
    await page.locator('nf-scene-file input[type=file]').setInputFiles(join(dir, name));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function falseClaimScene(): Scene {
  let doc = constructionEmpty();
  const ids: string[] = [];
  for (const [at, label] of [['0:0:1', 'A'], ['1:1:1', 'B'], ['2:2:1', 'C']] as const) {
    const r = constructionAdd(doc, { construction: { kind: 'point-free', parents: [], params: { at } }, label });
    doc = r.doc;
    ids.push(r.id);
  }
  doc = constructionAdd(doc, { construction: { kind: 'check-collinear', parents: ids, params: {} }, label: 'A, B, C are collinear' }).doc;
  return { title: 'Three points on a line?', notes: 'a false claim for the trials', doc, view: { xmin: rat(-13n), xmax: rat(13n), ymin: rat(-13n), ymax: rat(13n) } };
}

describe('scenes in the page', () => {
  it('starts with the default demo scene, saves it, and reopens the saved file exactly', async () => {
    const page = await fresh();
    try {
      const index = JSON.parse(demo('index.json'));
      const expected = sceneParse(demo(index.default));
      expect(JSON.parse(await docOf(page)).objects.map((o: { label: string }) => o.label)).toEqual(expected.doc.objects.map((o) => o.label));
      expect(await page.locator('nf-scene-file input.title').inputValue()).toBe(expected.title);
      const [download] = await Promise.all([page.waitForEvent('download'), page.locator('nf-scene-file button', { hasText: 'Save scene' }).click()]);
      const saved = readFileSync((await download.path())!, 'utf8');
      const scene = sceneParse(saved);
      expect(scene.doc).toEqual(expected.doc);
      expect(download.suggestedFilename()).toMatch(/\.ninefold\.json$/);
      // Open another scene, then the saved file again: back to the same construction.
      await openText(page, 'ninth.json', demo('ninth-point.json'));
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label === 'P9'));
      await openText(page, 'saved.json', saved);
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label === 'P+Q'));
      expect(sceneToText({ ...scene, doc: JSON.parse(await docOf(page)) })).toBe(sceneToText(scene));
    } finally {
      await page.close();
    }
  });

  it('opens a file dropped on the page', async () => {
    const page = await fresh();
    try {
      const text = demo('pascal-line.json');
      await page.evaluate((t) => {
        const dt = new DataTransfer();
        dt.items.add(new File([t], 'pascal.json', { type: 'application/json' }));
        window.dispatchEvent(new DragEvent('dragenter', { dataTransfer: dt, bubbles: true, cancelable: true }));
        window.dispatchEvent(new DragEvent('dragover', { dataTransfer: dt, bubbles: true, cancelable: true }));
        window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
      }, text);
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label === 'Pascal line'));
      expect(await page.locator('nf-scene-file input.title').inputValue()).toBe("Pascal's line of a hexagon on a conic");
    } finally {
      await page.close();
    }
  });

  it('refuses bad files with the place named, and keeps the open scene', async () => {
    const page = await fresh();
    try {
      const good = JSON.parse(demo('group-law.json'));
      const edit = (f: (x: any) => void) => {
        const c = structuredClone(good);
        f(c);
        return JSON.stringify(c, null, 2);
      };
      const cases: [string, string | Buffer, RegExp, string | RegExp][] = [
        // The JSON parser's wording differs between engines; the place is a line and column, or the end.
        ['malformed.json', '{ "format": "ninefold-scene", "version": 2, ', /not valid JSON/, /^(line 1, column 4[45]|end of file)$/],
        ['version.json', edit((x) => (x.version = 9)), /version 9 is not known/, 'version'],
        ['parent.json', edit((x) => (x.objects[4].parents[1] = 'p99')), /not the id of any object/, 'objects[4].parents[1]'],
        ['cycle.json', edit((x) => (x.objects[1].parents = ['p6'])), /cycle|is a point/, 'objects[1].parents[0]'],
        ['equation.json', edit((x) => (x.objects[0].params.equation = 'y^2 = x^3 - 7x + @')), /./, 'objects[0].params.equation, column 18'],
        ['blob.json', Buffer.alloc(50 * 1024 * 1024, 0x20), /50\.0 MB/, 'blob.json'],
      ];
      const before = await docOf(page);
      for (const [name, text, message, where] of cases) {
        await openText(page, name, text);
        const alert = page.locator('nf-scene-file .refusal');
        const placed = (w: string | null) => (typeof where === 'string' ? w === where : w !== null && where.test(w));
        await expect.poll(async () => (await alert.count()) > 0 && placed(await alert.getAttribute('data-where')), { timeout: 20_000 }).toBe(true);
        expect(await alert.textContent()).toMatch(message);
        expect(await alert.textContent()).toContain('The open scene is unchanged');
        expect(await docOf(page), name).toBe(before);
      }
    } finally {
      await page.close();
    }
  });

  it('shows labels from a file as text, never as markup', async () => {
    const page = await fresh();
    try {
      const file = JSON.parse(demo('group-law.json'));
      const payloads = ['<script>window.__pwned = 1</script>', '<img src=x onerror="window.__pwned = 2">', '<svg onload="window.__pwned = 3"></svg>'];
      file.title = '<img src=x onerror="window.__pwned = 4">';
      file.notes = '<script>window.__pwned = 5</script> and <b>bold</b>';
      payloads.forEach((p, k) => (file.objects[k + 1].label = p));
      await openText(page, 'hostile.json', JSON.stringify(file));
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label.startsWith('<script>')));
      await page.waitForTimeout(500);
      const seen = await page.evaluate(() => {
        const all: Element[] = [];
        const walk = (root: Document | ShadowRoot) => {
          for (const el of root.querySelectorAll('*')) {
            all.push(el);
            if (el.shadowRoot) walk(el.shadowRoot);
          }
        };
        walk(document);
        return {
          pwned: (window as any).__pwned ?? null,
          scripts: all.filter((e) => e.localName === 'script' && !(e as HTMLScriptElement).src && e.textContent?.includes('__pwned')).length,
          images: all.filter((e) => e.localName === 'img').length,
          texts: all.map((e) => (e.children.length === 0 ? e.textContent ?? '' : '')).filter((t) => t.includes('__pwned')),
        };
      });
      expect(seen.pwned).toBeNull();
      expect(seen.scripts).toBe(0);
      expect(seen.images).toBe(0);
      for (const p of payloads) expect(seen.texts.some((t) => t.includes(p)), p).toBe(true);
      expect(await page.locator('nf-scene-file input.title').inputValue()).toBe(file.title);
      expect(await page.locator('nf-scene-file textarea').inputValue()).toBe(file.notes);
      // The title and notes come back after a reload, with the construction.
      await page.waitForTimeout(400);
      await page.reload();
      await page.waitForFunction(() => (window as any).__ninefold?.doc()?.objects?.some((o: any) => o.label.startsWith('<script>')));
      await expect.poll(() => page.locator('nf-scene-file input.title').inputValue(), { timeout: 10_000 }).toBe(file.title);
      expect(await page.locator('nf-scene-file textarea').inputValue()).toBe(file.notes);
      expect(await page.evaluate(() => (window as any).__pwned ?? null)).toBeNull();
    } finally {
      await page.close();
    }
  });

  it('keeps the whole open scene under one key; a damaged entry is kept aside without harm; an older entry moves once', async () => {
    const page = await fresh();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    const ready = () => page.waitForFunction(() => (window as any).__ninefold?.doc()?.objects?.length > 0, null, { timeout: 60_000 });
    const stored = () => page.evaluate(() => Object.fromEntries(Object.keys(localStorage).filter((k) => k.startsWith('ninefold.')).sort().map((k) => [k, localStorage.getItem(k)])));
    try {
      await page.waitForTimeout(400); // the autosave runs 150 ms after a change
      const first = await stored();
      expect(Object.keys(first)).toEqual(['ninefold.autosave']);
      const record = JSON.parse(first['ninefold.autosave']!);
      expect(record.format).toBe('ninefold-autosave');
      expect(record.scene.title).toBe(await page.locator('nf-scene-file input.title').inputValue());
      expect(record.scene.view.xmin).toMatch(/^-?\d+(\/\d+)?$/);
      // A damaged entry: the page starts (default demo), says so, and keeps the text aside.
      const bad = '{"format":"ninefold-autosave","savedAt":"2026-01-01T00:00:00Z","scene":{"format":"ninefold-scene","version":2,"objects":[{"id":7}]}}';
      await page.evaluate((t) => localStorage.setItem('ninefold.autosave', t), bad);
      await page.reload();
      await ready();
      expect(await page.locator('nf-app .notice').textContent()).toMatch(/could not be restored/);
      await page.waitForTimeout(400);
      const after = await stored();
      expect(after['ninefold.autosave.unreadable']).toBe(bad);
      expect(JSON.parse(after['ninefold.autosave']!).scene.objects.length).toBeGreaterThan(0);
      // An entry in the page's older keys (construction as a scene file, title and notes beside it).
      const old = sceneParse(demo('pascal-line.json'));
      await page.evaluate(
        ([text, meta]) => {
          localStorage.removeItem('ninefold.autosave');
          localStorage.setItem('ninefold.open-construction', text);
          localStorage.setItem('ninefold.open-scene-meta', meta);
        },
        [sceneToText({ ...old, title: 'Open construction', notes: '' }), JSON.stringify({ title: 'Six points, moved over', notes: 'from the older keys' })],
      );
      await page.reload();
      await ready();
      await expect.poll(() => page.locator('nf-scene-file input.title').inputValue(), { timeout: 10_000 }).toBe('Six points, moved over');
      expect(await docOf(page)).toBe(JSON.stringify(JSON.parse(JSON.stringify(old.doc))));
      const moved = await stored();
      expect(Object.keys(moved).filter((k) => k !== 'ninefold.autosave.unreadable')).toEqual(['ninefold.autosave']);
      expect(errors).toEqual([]);
    } finally {
      await page.close();
    }
  });

  it('exports the view as SVG, TikZ and PNG', async () => {
    const page = await fresh();
    try {
      await page.locator('nf-scene-panel summary', { hasText: 'Figure for a paper' }).click();
      const grab = async (label: string) => {
        const [d] = await Promise.all([page.waitForEvent('download'), page.locator('nf-figure-export button', { hasText: label }).first().click()]);
        return { name: d.suggestedFilename(), data: readFileSync((await d.path())!) };
      };
      const svg = await grab('SVG');
      expect(svg.name).toMatch(/\.svg$/);
      const s = svg.data.toString('utf8');
      expect(s).toContain('<svg xmlns="http://www.w3.org/2000/svg"');
      expect(s).toContain('coefficients (1, 0, 0, 0, 0, -7, 0, -1, 0, 10)');
      const tikz = await grab('TikZ file');
      expect(tikz.data.toString('utf8')).toContain('\\begin{tikzpicture}');
      await page.locator('nf-figure-export input#d').fill('144');
      await page.locator('nf-figure-export input#d').dispatchEvent('change');
      const png = await grab('PNG');
      expect(png.data.subarray(1, 4).toString('latin1')).toBe('PNG');
      expect(png.data.readUInt32BE(16)).toBe(720); // 360 pt at 144 dpi
    } finally {
      await page.close();
    }
  });

  it('runs theorem trials as a job of the job worker: a theorem holds, a false claim fails and its counterexample opens', async () => {
    const page = await fresh();
    try {
      await page.locator('nf-scene-panel summary', { hasText: 'Theorem trials' }).click();
      const trials = page.locator('nf-trials');
      await trials.locator('input').first().fill('20');
      await trials.locator('input').first().dispatchEvent('change');
      await trials.locator('button', { hasText: 'Try on random instances' }).click();
      await expect.poll(async () => (await trials.locator('.note').textContent()) ?? '', { timeout: 60_000 }).toMatch(/20 random instances/);
      const rows = await trials.locator('tr').allTextContents();
      expect(rows.some((r) => r.includes('(P+Q)+R = P+(Q+R)') && r.includes('20 ✓'))).toBe(true);

      // A false claim: fails, and the counterexample opens as a scene in which the check fails.
      await openText(page, 'false.json', sceneToText(falseClaimScene()));
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label === 'A, B, C are collinear'));
      await trials.locator('button', { hasText: 'Try on random instances' }).click();
      await expect.poll(async () => (await trials.locator('.note').textContent()) ?? '', { timeout: 60_000 }).toMatch(/20 random instances/);
      await trials.locator('button', { hasText: 'Open counterexample' }).click();
      await page.waitForFunction(() => {
        const nf = (window as any).__ninefold;
        const id = nf.idOf('A, B, C are collinear');
        return id && nf.value(id)?.verdict === 'fails';
      });
      expect(await page.locator('nf-scene-file input.title').inputValue()).toBe('Counterexample: A, B, C are collinear');

      // Cancel: a long run (the pencil scene, tens of ms an instance) stops at once and keeps its counts.
      await openText(page, 'ninth.json', demo('ninth-point.json'));
      await page.waitForFunction(() => (window as any).__ninefold.doc().objects.some((o: any) => o.label === 'P9'));
      await trials.locator('input').first().fill('10000');
      await trials.locator('input').first().dispatchEvent('change');
      await trials.locator('button', { hasText: 'Try on random instances' }).click();
      await page.waitForTimeout(300);
      await trials.locator('button', { hasText: 'Cancel' }).click();
      expect(await trials.locator('.note').textContent()).toMatch(/Cancelled after \d+ of 10000 instances/);
    } finally {
      await page.close();
    }
  });
});
