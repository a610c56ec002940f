// The checks a scene file must pass beyond its shape: unique ids, parents that exist and have the types
// the kind asks for, no cycle, required params present and readable, equations that parse and agree with
// the stored coefficients, a proper view. Each refusal names the place in the file (`objects[3].parents[1]`).
//
// Returns the objects in construction order (parents first): a hand-edited file may list them in any
// order, but a cycle is refused.
import { KINDS } from '../construct/kinds.ts';
import type { ObjectType } from '../construct/types.ts';
import { InvalidInput, ParseError } from '../exact/errors.ts';
import { ratCmp, ratParse } from '../exact/rational.ts';
import { pointParse } from '../plane/parse-point.ts';
import { coefficientsOf } from './migrate.ts';
import { scenePathText as at } from './path.ts';
import type { SceneFile, SceneObject } from './schema.ts';

export function sceneFileCheck(file: SceneFile): SceneObject[] {
  const index = new Map<string, number>();
  file.objects.forEach((o, i) => {
    if (index.has(o.id)) {
      throw new InvalidInput(`the id "${o.id}" is used twice (first at ${at(['objects', index.get(o.id)!])})`, at(['objects', i, 'id']));
    }
    index.set(o.id, i);
  });
  file.objects.forEach((o, i) => objectCheck(file, o, i, index));
  if (file.activeCurve !== null) {
    const k = index.get(file.activeCurve);
    if (k === undefined) throw new InvalidInput(`no object has the id "${file.activeCurve}"`, 'activeCurve');
    if (file.objects[k].type !== 'curve') throw new InvalidInput(`"${file.activeCurve}" is not a curve`, 'activeCurve');
  }
  viewCheck(file);
  return constructionOrder(file, index);
}

function objectCheck(file: SceneFile, o: SceneObject, i: number, index: Map<string, number>): void {
  const spec = KINDS[o.kind];
  if (o.type !== spec.type) {
    throw new InvalidInput(`a "${o.kind}" object is a ${spec.type}, but the file says ${o.type}`, at(['objects', i, 'type']));
  }
  const min = spec.parents.length + (spec.more?.min ?? 0);
  if (o.parents.length < min || (!spec.more && o.parents.length > spec.parents.length)) {
    const want = spec.more ? `at least ${min}` : `${spec.parents.length}`;
    throw new InvalidInput(`a "${o.kind}" object needs ${want} parents, found ${o.parents.length}`, at(['objects', i, 'parents']));
  }
  o.parents.forEach((p, j) => {
    const k = index.get(p);
    if (k === undefined) throw new InvalidInput(`parent "${p}" is not the id of any object in the file`, at(['objects', i, 'parents', j]));
    const allowed: readonly ObjectType[] = j < spec.parents.length ? spec.parents[j] : [spec.more!.type];
    const t = file.objects[k].type;
    if (!allowed.includes(t)) {
      throw new InvalidInput(`parent "${p}" is a ${t}, but a "${o.kind}" needs a ${allowed.join(' or ')} here`, at(['objects', i, 'parents', j]));
    }
  });
  if (o.helperOf !== undefined && !index.has(o.helperOf)) {
    throw new InvalidInput(`"${o.helperOf}" is not the id of any object in the file`, at(['objects', i, 'helperOf']));
  }
  for (const name of spec.params) {
    if (o.params[name] === undefined) {
      throw new InvalidInput(`a "${o.kind}" object needs the param "${name}"`, at(['objects', i, 'params']));
    }
  }
  paramsCheck(o, i);
}

function paramsCheck(o: SceneObject, i: number): void {
  const p = o.params;
  const where = (name: string) => at(['objects', i, 'params', name]);
  if (o.kind === 'curve-equation') {
    const coeffs = coefficientsOf(p.equation, where('equation'));
    if (o.coefficients === undefined) throw new InvalidInput('a curve from an equation carries its coefficients', at(['objects', i]));
    if (o.coefficients.length !== coeffs.length || o.coefficients.some((c, k) => BigInt(c) !== BigInt(coeffs[k]))) {
      throw new InvalidInput(
        `the coefficients do not match the equation "${p.equation}" (it gives [${coeffs.join(', ')}])`,
        at(['objects', i, 'coefficients']),
      );
    }
  } else if (o.coefficients !== undefined) {
    throw new InvalidInput('only a curve from an equation carries coefficients', at(['objects', i, 'coefficients']));
  }
  if (p.at !== undefined && (o.kind === 'point-free' || o.kind === 'point-on-curve' || o.kind === 'line-equation')) {
    if (!p.at.includes(':')) throw new ParseError(`expected "X:Y:Z", found "${p.at}"`, 1, where('at'));
    pointParse(p.at, where('at'));
  }
  if (o.kind === 'point-on-curve' && p.at === undefined && ((p.x === undefined && p.y === undefined) || p.near === undefined)) {
    throw new InvalidInput('a point on a curve needs "at", or "x" (or "y") with "near"', at(['objects', i, 'params']));
  }
  for (const name of ['x', 'y', 'near'] as const) if (p[name] !== undefined) ratParse(p[name], where(name));
  for (const name of ['index', 'n'] as const) {
    if (p[name] !== undefined && !/^-?\d{1,12}$/.test(p[name])) throw new InvalidInput(`expected an integer, found "${p[name]}"`, where(name));
  }
  for (const name of ['member'] as const) {
    if (p[name] !== undefined && !/^-?\d+:-?\d+$/.test(p[name])) throw new InvalidInput(`expected "s:t" with integers, found "${p[name]}"`, where(name));
  }
  if (o.kind === 'point-parameter' && !/^-?\d+(\/\d+)?:-?\d+(\/\d+)?$/.test(p.at)) {
    throw new InvalidInput(`expected a parameter "s:t", found "${p.at}"`, where('at'));
  }
}

function viewCheck(file: SceneFile): void {
  const v = file.view;
  if (ratCmp(ratParse(v.xmin), ratParse(v.xmax)) >= 0) throw new InvalidInput('the view needs xmin < xmax', 'view.xmax');
  if (ratCmp(ratParse(v.ymin), ratParse(v.ymax)) >= 0) throw new InvalidInput('the view needs ymin < ymax', 'view.ymax');
}

/** Depth-first topological order; a back edge is a cycle, reported at the parent reference closing it. */
function constructionOrder(file: SceneFile, index: Map<string, number>): SceneObject[] {
  const state = new Uint8Array(file.objects.length); // 0 new, 1 on the stack, 2 done
  const out: SceneObject[] = [];
  for (let root = 0; root < file.objects.length; root++) {
    if (state[root] !== 0) continue;
    // Iterative, so a long chain in a hostile file cannot overflow the stack.
    const stack: [number, number][] = [[root, 0]];
    state[root] = 1;
    while (stack.length > 0) {
      const top = stack[stack.length - 1];
      const [i, j] = top;
      const parents = file.objects[i].parents;
      if (j === parents.length) {
        state[i] = 2;
        out.push(file.objects[i]);
        stack.pop();
        continue;
      }
      top[1] = j + 1;
      const k = index.get(parents[j])!;
      if (state[k] === 1) {
        throw new InvalidInput(
          `"${file.objects[i].id}" depends on "${parents[j]}", which depends on "${file.objects[i].id}" again: a cycle`,
          at(['objects', i, 'parents', j]),
        );
      }
      if (state[k] === 0) {
        state[k] = 1;
        stack.push([k, 0]);
      }
    }
  }
  return out;
}
