// One hierarchy for every mathematical or input failure. The CLI turns any of these into
// {"error": {"message", "where"}} with exit 2; the UI shows `message` beside the thing named by `where`.

export class NinefoldError extends Error {
  /** Where the problem is: an argument name, a column ("column 4"), or a path inside a scene file. */
  readonly where: string;
  constructor(message: string, where = '') {
    super(message);
    this.name = new.target.name;
    this.where = where;
  }
}

/** Text that does not parse (an equation, a point, a number). `column` is 1-based. */
export class ParseError extends NinefoldError {
  readonly column: number;
  constructor(message: string, column: number, where = `column ${column}`) {
    super(message, where);
    this.column = column;
  }
}

/** Input of the right shape that is not acceptable (wrong count of points, zero vector, bad option). */
export class InvalidInput extends NinefoldError {}

/** A point that was required to lie on a curve does not. */
export class NotOnCurve extends NinefoldError {}

/** An operation that needs a smooth point was handed a singular one. */
export class SingularPoint extends NinefoldError {}

/** A construction whose answer is not unique or not defined (a line inside the curve, two equal points). */
export class Degenerate extends NinefoldError {}

/** An exact answer was asked for where only an algebraic or approximate one exists. */
export class NotExact extends NinefoldError {}

/** Long work stopped on request. */
export class Cancelled extends NinefoldError {
  constructor(where = '') {
    super('cancelled', where);
  }
}
