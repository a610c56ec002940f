// The scene file, version 1 (read only; migrate.ts turns it into version 2 on load).
//
// It differs from version 2 in two small ways: the position of a free point or a point on a curve was
// the affine text "x,y" (so a point at infinity could not be saved), and a curve given by its equation
// carried only the equation text, with no exact coefficient list beside it.
import { z } from 'zod';
import { SCENE_FORMAT, SCENE_LIMITS, labelText, objectSchema, viewSchema, idText } from './schema.ts';

export const objectSchemaV1 = objectSchema.omit({ coefficients: true });

export const sceneSchemaV1 = z.strictObject({
  format: z.literal(SCENE_FORMAT),
  version: z.literal(1),
  title: labelText,
  notes: z.string().max(SCENE_LIMITS.notes),
  objects: z.array(objectSchemaV1).max(SCENE_LIMITS.objects),
  activeCurve: idText.nullable(),
  nextId: z.number().int().min(0).max(1e9),
  view: viewSchema,
});

export type SceneFileV1 = z.infer<typeof sceneSchemaV1>;
