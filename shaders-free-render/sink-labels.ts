// Which kept Text shows which label of a frame. Making a Text and measuring its string is the dear part
// of text on Pixi's canvas renderer, moving one is cheap: so a label goes first to a kept Text of its
// look already showing its string, then to a free one of its look (only its string is set), and only
// then to a new one.
//
// Canonical form: `use[i]` is the index in `kept` of the Text for wants[i], or -1 for a new Text; no kept
// index is used twice; `retext[i]` says the Text's string must be set.

export interface LabelKey {
  /** Size, colour, halo: what a Text's style fixes. */
  readonly look: string;
  readonly text: string;
}

export function labelMatch(kept: readonly LabelKey[], wants: readonly LabelKey[]): { use: number[]; retext: boolean[] } {
  const same = new Map<string, number[]>();
  for (let k = kept.length - 1; k >= 0; k--) {
    const key = `${kept[k].look}\u0000${kept[k].text}`;
    const list = same.get(key);
    if (list) list.push(k);
    else same.set(key, [k]);
  }
  const taken = new Uint8Array(kept.length);
  const use = new Array<number>(wants.length).fill(-1);
  const retext = new Array<boolean>(wants.length).fill(false);
  for (let i = 0; i < wants.length; i++) {
    const k = same.get(`${wants[i].look}\u0000${wants[i].text}`)?.pop();
    if (k !== undefined) {
      use[i] = k;
      taken[k] = 1;
    }
  }
  const free = new Map<string, number[]>();
  for (let k = kept.length - 1; k >= 0; k--) {
    if (taken[k]) continue;
    const list = free.get(kept[k].look);
    if (list) list.push(k);
    else free.set(kept[k].look, [k]);
  }
  for (let i = 0; i < wants.length; i++) {
    if (use[i] >= 0) continue;
    const k = free.get(wants[i].look)?.pop();
    if (k !== undefined) {
      use[i] = k;
      retext[i] = true;
    }
  }
  return { use, retext };
}
