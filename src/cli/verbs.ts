// The registry of CLI verbs. Each verb lives in its own file under src/cli/verbs/; add one line here.
import type { Verb } from './verb.ts';
import { form } from './verbs/form.ts';
import { through } from './verbs/through.ts';
import { meet } from './verbs/meet.ts';
import { ninth } from './verbs/ninth.ts';
import { nine } from './verbs/nine.ts';

export const VERBS: readonly Verb[] = [
  form,
  through,
  meet,
  ninth,
  nine,
];
