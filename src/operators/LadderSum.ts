/**
 * LadderSum: a sum of products of ladder operators with complex coefficients,
 * Σ_t c_t · o_t1 o_t2 … (written left to right as in the product; a product with no factors is the identity).
 */

/** One ladder factor: a_mode, or a†_mode when `dagger`. */
export interface LadderOp {
  readonly mode: number;
  readonly dagger: boolean;
}

/** c · ops[0] ops[1] …, c = re + i·im. */
export interface LadderTerm {
  readonly ops: readonly LadderOp[];
  readonly re: number;
  readonly im: number;
}

export interface LadderSum {
  readonly terms: readonly LadderTerm[];
}
