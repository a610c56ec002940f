// Version migration: every older scene file is turned into the current shape, one step per version, so
// a file from any release opens. Each step is pure and takes an already validated file of its version.
//
// v1 -> v2: free points and points on a curve saved their position as affine "x,y"; v2 writes the
// projective "X:Y:Z" (room for points at infinity). Curves given by their equation gain their exact
// primitive coefficient list (computed by the parser, the same path as a new curve).
import { formParse } from '../poly/parse.ts';
import { formPrimitive } from '../poly/form.ts';
import { pointParse, pointToString } from '../plane/parse-point.ts';
import { NinefoldError, ParseError } from '../exact/errors.ts';
import { SCENE_VERSION, type SceneFile, type SceneObject } from './schema.ts';
import type { SceneFileV1 } from './schema-v1.ts';
import { scenePathText } from './path.ts';

const POSITIONED = new Set(['point-free', 'point-on-curve']);

export function sceneMigrateV1(file: SceneFileV1): SceneFile {
  const objects: SceneObject[] = file.objects.map((o, i) => {
    const params = { ...o.params };
    if (POSITIONED.has(o.kind) && params.at !== undefined) {
      const where = scenePathText(['objects', i, 'params', 'at']);
      if (params.at.includes(':')) {
        throw new ParseError(`a version 1 file writes positions as "x,y", found "${params.at}"`, 1, where);
      }
      params.at = pointToString(pointParse(params.at, where));
    }
    const out: SceneObject = { ...o, params };
    if (o.kind === 'curve-equation' && params.equation !== undefined) {
      return { ...out, coefficients: coefficientsOf(params.equation, scenePathText(['objects', i, 'params', 'equation'])) };
    }
    return out;
  });
  return { ...file, version: SCENE_VERSION as 2, objects };
}

/** Primitive integer coefficients of an equation, as strings; a parse failure names `where` and its column. */
export function coefficientsOf(equation: string, where: string): string[] {
  try {
    return formPrimitive(formParse(equation, where).form).coeffs.map((c) => c.toString());
  } catch (e) {
    if (e instanceof NinefoldError && !e.where.startsWith(where)) throw new ParseError(e.message, 1, where);
    throw e;
  }
}
