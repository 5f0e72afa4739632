/**
 * productErrorBound: the telescoping bound for a product of approximate block-encodings. With projected blocks Ũ_k
 * (‖Ũ_k‖ ≤ 1, being parts of unitaries) and targets M̂_k = M_k/α_k, ‖Ũ_k − M̂_k‖ ≤ e_k, so ‖M̂_k‖ ≤ 1 + e_k and
 * ‖Π Ũ_k − Π M̂_k‖ ≤ Σ_k e_k Π_{j>k} (1 + e_j) (the factor order does not matter for this bound's validity when it is
 * applied in either order; we use the left-to-right telescoping sum, common practice).
 */
export function productErrorBound(errors: readonly number[]): number {
  let bound = 0;
  let tail = 1;
  for (let k = errors.length - 1; k >= 0; k--) {
    const e = errors[k]!;
    bound += e * tail;
    tail *= 1 + e;
  }
  return bound;
}
