import type { Args } from './args.ts';

/** One CLI verb: a thin face over src/cubic, src/construct or the tracer, returning one JSON value. */
export interface Verb {
  readonly name: string;
  /** One line for `cli help`: the synopsis. */
  readonly usage: string;
  /** Option names that take no value. */
  readonly switches?: readonly string[];
  run(args: Args): unknown | Promise<unknown>;
}
