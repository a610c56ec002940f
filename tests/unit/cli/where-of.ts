// The `where` of the Ninefold error a CLI verb throws for bad input; any other outcome fails the test.
import { NinefoldError } from '../../../src/exact/errors.ts';

export function whereOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    if (e instanceof NinefoldError) return e.where;
    throw e;
  }
  throw new Error('expected an error');
}
