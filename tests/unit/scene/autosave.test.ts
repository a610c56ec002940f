// The autosave record: round trip, and damaged records refused with the place named.
import { describe, expect, it } from 'vitest';
import { sceneAutosaveParse, sceneAutosaveText } from '../../../src/scene/autosave.ts';
import { sampleScene } from './sample.ts';
import { NinefoldError } from '../../../src/exact/errors.ts';

describe('autosave', () => {
  it('restores exactly what was saved, with the time', () => {
    const t = new Date(Date.UTC(2026, 11, 1, 22, 30, 0));
    const back = sceneAutosaveParse(sceneAutosaveText(sampleScene(), t));
    expect(back.savedAt.toISOString()).toBe('2026-12-01T22:30:00.000Z');
    expect(back.scene).toEqual(sampleScene());
  });
  it('refuses a damaged record and names the place inside the scene', () => {
    const text = sceneAutosaveText(sampleScene(), new Date(0)).replace('"parents":["c1"]', '"parents":["zz"]');
    try {
      sceneAutosaveParse(text);
      throw new Error('accepted');
    } catch (e) {
      expect(e).toBeInstanceOf(NinefoldError);
      expect((e as NinefoldError).where).toBe('autosave.scene.objects[1].parents[0]');
    }
    expect(() => sceneAutosaveParse('{')).toThrow(/not valid JSON/);
    expect(() => sceneAutosaveParse('{"format":"other"}')).toThrow(/not a Ninefold autosave/);
    expect(() => sceneAutosaveParse('{"format":"ninefold-autosave","savedAt":"yesterday","scene":{}}')).toThrow(/no valid time/);
  });
});
