// A scene -> everything a figure exporter needs: values recomputed exactly from the file, the display
// list for the scene's view, and the exact facts. The CLI and the page's export both come through here.
import { constructionEvaluate } from '../construct/evaluate.ts';
import type { ValueMap } from '../construct/types.ts';
import type { Scene } from '../scene/scene.ts';
import { constructionDisplayList } from './display.ts';
import { constructionFacts, figureViewOf } from './facts.ts';
import { pageFrame, type FigureInput, type FigureOptions } from './figure.ts';

/** Trace at this many pixels per point of the figure, so curves stay smooth in print. */
const TRACE_PX_PER_PT = 2;

export function sceneFigureInput(scene: Scene, options: FigureOptions = {}, values?: ValueMap): FigureInput {
  const vals = values ?? constructionEvaluate(scene.doc);
  const view = figureViewOf(scene.view);
  const page = pageFrame(view, options);
  const list = constructionDisplayList(scene.doc, vals, {
    ...view,
    widthPx: Math.round(page.widthPt * TRACE_PX_PER_PT),
    heightPx: Math.round(page.heightPt * TRACE_PX_PER_PT),
  }, { axes: options.axes ?? false });
  return { list, view, facts: constructionFacts(scene.doc, vals), options: { title: scene.title, ...options } };
}
