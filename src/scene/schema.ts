// The scene file, version 2 (the current format): the shape checked by zod on load.
//
// A scene wraps the construction data model of src/construct/types.ts (ConstructionDoc) with a format
// tag, a version, a title, notes and the view. Canonical form written by `sceneToText`: every exact value
// is a string — rationals "-17/4", integers "12", points "X:Y:Z" as primitive integer triples — never a
// JSON number; objects are listed parents first; a curve given by its equation also carries its primitive
// integer coefficients (monomial order of src/poly/form.ts) so the file states the curve exactly even for
// a reader without our parser.
//
// zod and not hand-written checks: one declaration gives the TypeScript type, the validator and the path
// of every failure (`objects[3].parents[1]`), and strict objects refuse unknown fields, which catches typos.
import { z } from 'zod';
import { KINDS } from '../construct/kinds.ts';
import type { ConstructionKind } from '../construct/types.ts';

export const SCENE_FORMAT = 'ninefold-scene';
export const SCENE_VERSION = 2;

/** Limits that keep a hostile or broken file from tying up the page. */
export const SCENE_LIMITS = {
  bytes: 4 * 1024 * 1024,
  objects: 4000,
  text: 400,
  notes: 20_000,
  param: 8000,
  digits: 4000,
} as const;

const D = SCENE_LIMITS.digits;
export const integerText = z.string().regex(new RegExp(`^-?\\d{1,${D}}$`), 'expected an integer written as a string, like "-12"');
export const rationalText = z
  .string()
  .regex(new RegExp(`^-?\\d{1,${D}}(/\\d{1,${D}})?$`), 'expected a rational written as a string, like "-17/4"')
  .refine((s) => !/\/0+$/.test(s), 'zero denominator');
export const idText = z.string().regex(/^[A-Za-z_][A-Za-z0-9_.-]{0,63}$/, 'expected an id: a letter or _, then letters, digits, _ . -');
export const labelText = z.string().max(SCENE_LIMITS.text, `at most ${SCENE_LIMITS.text} characters`);

const KIND_NAMES = Object.keys(KINDS) as [ConstructionKind, ...ConstructionKind[]];

export const styleSchema = z.strictObject({
  colour: z.string().regex(/^#[0-9a-fA-F]{6}$/, 'expected a colour "#rrggbb"'),
  visible: z.boolean(),
  showLabel: z.boolean(),
  stroke: z.enum(['solid', 'dashed', 'dotted']).optional(),
  /** Stroke width in CSS pixels, as a decimal string ("1.5"): no JSON numbers in a scene file. */
  width: z.string().regex(/^\d{1,2}(\.\d{1,3})?$/, 'expected a width in pixels like "1.5"').optional(),
});

export const objectSchema = z.strictObject({
  id: idText,
  type: z.enum(['curve', 'point', 'line', 'check']),
  label: labelText,
  kind: z.enum(KIND_NAMES, { error: `expected a construction kind (${KIND_NAMES.join(', ')})` }),
  /** Ids of earlier objects, in the order the kind reads them. */
  parents: z.array(idText).max(64),
  /** Exact params as strings: equations as typed, points "X:Y:Z", rationals, integers. */
  params: z.record(z.string().regex(/^[a-z][a-zA-Z0-9]{0,31}$/, 'expected a param name'), z.string().max(SCENE_LIMITS.param)),
  style: styleSchema,
  helperOf: idText.optional(),
  /** Curves from an equation: the primitive integer coefficients, in the monomial order of form.ts. */
  coefficients: z.array(integerText).min(3).max(28).optional(),
});

export const viewSchema = z.strictObject({
  xmin: rationalText,
  xmax: rationalText,
  ymin: rationalText,
  ymax: rationalText,
});

export const sceneSchema = z.strictObject({
  format: z.literal(SCENE_FORMAT),
  version: z.literal(SCENE_VERSION),
  title: labelText,
  notes: z.string().max(SCENE_LIMITS.notes),
  objects: z.array(objectSchema).max(SCENE_LIMITS.objects),
  activeCurve: idText.nullable(),
  nextId: z.number().int().min(0).max(1e9),
  view: viewSchema,
});

export type SceneStyle = z.infer<typeof styleSchema>;
export type SceneObject = z.infer<typeof objectSchema>;
export type SceneView = z.infer<typeof viewSchema>;
export type SceneFile = z.infer<typeof sceneSchema>;
