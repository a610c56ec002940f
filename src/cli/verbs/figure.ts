// `figure SCENE.json --svg OUT.svg --tikz OUT.tex --snippet OUT.tex --png OUT.png --dpi N`: export the
// scene's view as a figure, from the same display list the page draws.
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { InvalidInput } from '../../exact/errors.ts';
import { sceneParse } from '../../scene/load.ts';
import { SCENE_LIMITS } from '../../scene/schema.ts';
import { sceneFigureInput } from '../../export/scene-figure.ts';
import { figureToSvg } from '../../export/svg.ts';
import { figureToTikzSnippet, figureToTikzStandalone } from '../../export/tikz.ts';
import { svgToPng } from '../../export/png.ts';
import { optionInteger, optionString, positionalAt, type Args } from '../args.ts';
import type { Verb } from '../verb.ts';

/** Read a scene file for a verb, refusing an oversized one before reading it. */
export function sceneFileRead(path: string, where = 'argument 1'): string {
  let size: number;
  try {
    size = statSync(path).size;
  } catch {
    throw new InvalidInput(`cannot read the scene file "${path}"`, where);
  }
  if (size > SCENE_LIMITS.bytes) {
    throw new InvalidInput(`the file is ${(size / 1048576).toFixed(1)} MB; a scene file is at most ${(SCENE_LIMITS.bytes / 1048576).toFixed(1)} MB`, where);
  }
  return readFileSync(path, 'utf8');
}

function write(path: string, data: string | Uint8Array, option: string): void {
  try {
    writeFileSync(path, data);
  } catch (e) {
    throw new InvalidInput(`cannot write "${path}": ${(e as Error).message}`, option);
  }
}

export const figure: Verb = {
  name: 'figure',
  usage: 'figure SCENE.json [--svg OUT.svg] [--tikz OUT.tex] [--snippet OUT.tex] [--png OUT.png --dpi N] [--width PT] [--font PT] [--grey] [--axes]',
  switches: ['grey', 'axes'],
  run(args: Args) {
    const file = positionalAt(args, 0, 'scene file');
    const scene = sceneParse(sceneFileRead(file));
    const svgOut = optionString(args, 'svg');
    const tikzOut = optionString(args, 'tikz');
    const snippetOut = optionString(args, 'snippet');
    const pngOut = optionString(args, 'png');
    if (!svgOut && !tikzOut && !snippetOut && !pngOut) {
      throw new InvalidInput('say what to write: --svg OUT.svg, --tikz OUT.tex, --snippet OUT.tex or --png OUT.png', 'options');
    }
    const dpi = optionInteger(args, 'dpi', 300, 10, 2400);
    const options = {
      widthPt: optionInteger(args, 'width', 360, 36, 4000),
      fontSizePt: optionInteger(args, 'font', 9, 4, 48),
      greyscale: args.options.get('grey') === true,
      axes: args.options.get('axes') === true,
    };
    const input = sceneFigureInput(scene, options);
    const written: Record<string, string> = {};
    const svg = figureToSvg(input);
    if (svgOut) {
      write(svgOut, svg, '--svg');
      written.svg = svgOut;
    }
    if (tikzOut) {
      write(tikzOut, figureToTikzStandalone(input), '--tikz');
      written.tikz = tikzOut;
    }
    if (snippetOut) {
      write(snippetOut, figureToTikzSnippet(input), '--snippet');
      written.snippet = snippetOut;
    }
    if (pngOut) {
      write(pngOut, svgToPng(svg, dpi), '--png');
      written.png = pngOut;
    }
    const f = input.list.items;
    return {
      scene: file,
      title: scene.title,
      written,
      ...(pngOut ? { dpi } : {}),
      sizePt: { width: options.widthPt, height: Math.round(((options.widthPt * (input.view.ymax - input.view.ymin)) / (input.view.xmax - input.view.xmin)) * 100) / 100 },
      drawn: {
        polylines: f.filter((i) => i.kind === 'polyline').length,
        segments: f.filter((i) => i.kind === 'segment').length,
        dots: f.filter((i) => i.kind === 'dot').length,
        labels: f.filter((i) => i.kind === 'label').length,
      },
      objects: input.facts,
    };
  },
};
