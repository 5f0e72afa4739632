// UnreachablePrecisionError: the resolvent plan cannot meet the precision asked for, because the fast inverse's error
// bound (at its register cap) is too large; carries the smallest precision that is reachable, or null when none is.
export class UnreachablePrecisionError extends RangeError {
  constructor(
    message: string,
    /** The smallest ε the plan can meet with this fast inverse, or null when no ε < 1 is reachable. */
    readonly reachable: number | null,
  ) {
    super(message);
    this.name = 'UnreachablePrecisionError';
  }
}
