// The registry of CLI verbs, in the order `cli help` lists them. Each verb lives in its own file under
// src/cli/verbs/; add one line here.
import type { Verb } from './verb.ts';
import { form } from './verbs/form.ts';
import { through } from './verbs/through.ts';
import { curve } from './verbs/curve.ts';
import { parametrise } from './verbs/parametrise.ts';
import { third } from './verbs/third.ts';
import { sum } from './verbs/sum.ts';
import { negate } from './verbs/negate.ts';
import { multiple } from './verbs/multiple.ts';
import { order } from './verbs/order.ts';
import { weierstrass } from './verbs/weierstrass.ts';
import { meet } from './verbs/meet.ts';
import { ninth } from './verbs/ninth.ts';
import { nine } from './verbs/nine.ts';
import { points } from './verbs/points.ts';
import { trace } from './verbs/trace.ts';
import { figure } from './verbs/figure.ts';
import { trials } from './verbs/trials.ts';

export const VERBS: readonly Verb[] = [
  form,
  through,
  curve,
  parametrise,
  third,
  sum,
  negate,
  multiple,
  order,
  weierstrass,
  meet,
  ninth,
  nine,
  points,
  trace,
  figure,
  trials,
];
