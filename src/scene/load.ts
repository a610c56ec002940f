// Opening a scene file: size limit, JSON, format tag and version, schema (zod), migration of older
// versions, then the integrity checks. Any refusal is a NinefoldError whose `where` is the place in the
// file (a JSON path like `objects[3].parents[1]`, or "line 4, column 7" for broken JSON); nothing is
// returned half-read, so the caller's open scene stays as it was.
import type { z } from 'zod';
import { InvalidInput, ParseError } from '../exact/errors.ts';
import { ratParse } from '../exact/rational.ts';
import type { ConstructionObject, Style } from '../construct/types.ts';
import { constructionValidate } from '../construct/graph.ts';
import { sceneFileCheck } from './integrity.ts';
import { sceneMigrateV1 } from './migrate.ts';
import { scenePathText, type PathPart } from './path.ts';
import { SCENE_FORMAT, SCENE_LIMITS, SCENE_VERSION, sceneSchema, type SceneFile, type SceneObject } from './schema.ts';
import { sceneSchemaV1 } from './schema-v1.ts';
import type { Scene } from './scene.ts';

export const SCENE_VERSIONS_READ = [1, SCENE_VERSION] as const;

/** Read a scene file's text into a Scene, or throw a NinefoldError naming the place. */
export function sceneParse(text: string): Scene {
  return sceneFromFile(sceneFileParse(text));
}

/** The validated, migrated, current-version file (objects in construction order). */
export function sceneFileParse(text: string): SceneFile {
  sizeCheck(text);
  const raw = jsonParse(text);
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new InvalidInput('a scene file is one JSON object { "format": "ninefold-scene", ... }', scenePathText([]));
  }
  const obj = raw as Record<string, unknown>;
  if (obj.format !== SCENE_FORMAT) {
    throw new InvalidInput(`not a Ninefold scene: "format" must be "${SCENE_FORMAT}"`, 'format');
  }
  let file: SceneFile;
  if (obj.version === 1) file = sceneMigrateV1(validate(sceneSchemaV1, raw));
  else if (obj.version === SCENE_VERSION) file = validate(sceneSchema, raw);
  else {
    throw new InvalidInput(
      `scene version ${JSON.stringify(obj.version)} is not known; this build reads versions ${SCENE_VERSIONS_READ.join(' and ')}`,
      'version',
    );
  }
  const objects = sceneFileCheck(file);
  return { ...file, objects };
}

function sizeCheck(text: string): void {
  // A UTF-16 length over the limit is over it in bytes too; only near the limit count bytes exactly.
  const bytes = text.length > SCENE_LIMITS.bytes ? text.length : new TextEncoder().encode(text).length;
  if (bytes > SCENE_LIMITS.bytes) {
    const mb = (n: number) => (n / (1024 * 1024)).toFixed(1);
    throw new InvalidInput(`the file is ${mb(bytes)} MB; a scene file is at most ${mb(SCENE_LIMITS.bytes)} MB`, scenePathText([]));
  }
}

function jsonParse(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const message = e instanceof Error ? e.message : String(e);
    const m = /position (\d+)/.exec(message);
    if (m) {
      const pos = Number(m[1]);
      const before = text.slice(0, pos).split('\n');
      const line = before.length;
      const column = before[before.length - 1].length + 1;
      throw new ParseError(`the file is not valid JSON: ${message}`, column, `line ${line}, column ${column}`);
    }
    throw new ParseError(`the file is not valid JSON: ${message}`, 1, 'end of file');
  }
}

function validate<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> {
  const r = schema.safeParse(raw);
  if (r.success) return r.data;
  const issue = deepest(r.error.issues);
  throw new InvalidInput(issue.message, scenePathText(issue.path as PathPart[]));
}

/** The issue with the longest path: the most specific place (a union failure lists its branches). */
function deepest(issues: readonly z.core.$ZodIssue[]): z.core.$ZodIssue {
  return issues.reduce((a, b) => (b.path.length > a.path.length ? b : a));
}

export function sceneFromFile(file: SceneFile): Scene {
  return {
    title: file.title,
    notes: file.notes,
    // E7's own check of the construction's invariants, after ours named the places in the file.
    doc: constructionValidate({ objects: file.objects.map(objectFromFile), activeCurve: file.activeCurve, nextId: file.nextId }),
    view: {
      xmin: ratParse(file.view.xmin),
      xmax: ratParse(file.view.xmax),
      ymin: ratParse(file.view.ymin),
      ymax: ratParse(file.view.ymax),
    },
  };
}

function objectFromFile(o: SceneObject): ConstructionObject {
  const s = o.style;
  const style: Style = {
    colour: s.colour.toLowerCase(),
    visible: s.visible,
    showLabel: s.showLabel,
    ...(s.stroke !== undefined ? { stroke: s.stroke } : {}),
    ...(s.width !== undefined ? { width: Number(s.width) } : {}),
  };
  return {
    id: o.id,
    type: o.type,
    label: o.label,
    style,
    construction: { kind: o.kind, parents: [...o.parents], params: { ...o.params } },
    ...(o.helperOf !== undefined ? { helperOf: o.helperOf } : {}),
  };
}
