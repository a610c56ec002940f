// The registry of CLI verbs. Each verb lives in its own file under src/cli/verbs/; add one line here.
import type { Verb } from './verb.ts';
import { form } from './verbs/form.ts';
import { through } from './verbs/through.ts';

export const VERBS: readonly Verb[] = [
  form,
  through,
];
