/**
 * ResolventReport: what an inverse block-encoding of (w − H)⁻¹ costs and how precise it is, route by route: the α of
 * each factor, the condition bound, δ, the polynomial degree, queries to each factor, the error budget and the bound.
 */
import type { ComplexScalar } from '../linalg/ComplexScalar.js';

export type ResolventRoute = 'preconditioned' | 'direct';

/** How the preconditioned route block-encoded B' = B − b₀I, and what each encoding's α is. */
export interface BEncodingReport {
  readonly used: 'pauli' | 'arithmetic';
  /** α of the Pauli LCU of B' (b₀ = B's identity coefficient). */
  readonly alphaPauli: number;
  /** α = β of the arithmetic encoding on the route's window (b₀ = the centre of B's range); null when B is not diagonal. */
  readonly alphaArithmetic: number | null;
  /** Why B is not diagonal in the occupation basis (only the Pauli LCU applies). */
  readonly notDiagonal?: string;
  /** resolventCost's 'cheaper' choice: Toffolis of one application of the route with each encoding (null: not available). */
  readonly toffoli?: { readonly pauli: number | null; readonly arithmetic: number | null };
}

export interface ResolventReport {
  readonly route: ResolventRoute;
  readonly w: ComplexScalar;
  /** Electron-number window [min, max] of the encoded operator P (w − H)⁻¹ P; null: the whole Fock space. */
  readonly window: { readonly min: number; readonly max: number } | null;
  /** The ε planned for (bound on the encoded operator in projected-block units): the requested one unless it was not reachable. */
  readonly precision: number;
  /** The ε asked for; larger than `precision` never, smaller only with the `reachablePrecision` option. */
  readonly requestedPrecision: number;
  /** How ε was split: the polynomial's share and the quantisation's share (fast inverse plus its propagation). */
  readonly split: { readonly polynomial: number; readonly quantisation: number };
  /** K ≥ ‖M⁻¹‖ for the inverted operator M (I − F·B', or w − H). */
  readonly conditionBound: number;
  /** Where K comes from: the a-priori bound, or a caller's (e.g. an exact norm on a small model's sector). */
  readonly conditionSource: 'a priori' | 'given';
  /** The a-priori K: 1 + α_B'/|Im w| (preconditioned) or 1/|Im w| (direct). */
  readonly aPrioriConditionBound: number;
  /** b₀, the identity part of B moved into the shift of the fast inverse (0 on the direct route). */
  readonly bShift: number;
  /** Bound on ‖M‖. */
  readonly normBoundM: number;
  /** Preconditioned route: B's encoding (Pauli LCU or arithmetic) and both α's; null on the direct route. */
  readonly bEncoding: BEncodingReport | null;
  /** The bound used for ‖B'‖ = ‖B − b₀I‖ (preconditioned route): α_B' of the encoding used. */
  readonly normBoundB: number | null;
  readonly alphas: {
    readonly fastInverse: number | null;
    readonly B: number | null;
    /** α_M of the inverted encoding. */
    readonly M: number;
    /** α of the QSVT inverse of M, 1/(s α_M). */
    readonly inverse: number;
    /** α of the whole encoding of (w − H)⁻¹. */
    readonly total: number;
  };
  /** δ = 1/(α_M K) − e_M: the polynomial approximates s/x on δ ≤ |x| ≤ 1. */
  readonly delta: number;
  /** s (null in a cost-only report). */
  readonly scale: number | null;
  readonly degree: number;
  /** 'measured': the built polynomial's degree; 'truncation bound': Childs–Kothari–Somma's bound (cost-only report). */
  readonly degreeSource: 'measured' | 'truncation bound';
  /** Calls of each factor's block (either direction): M, and inside it F and B (preconditioned) or H (direct). */
  readonly queries: { readonly M: number; readonly fastInverse: number; readonly B: number; readonly H: number };
  /** Error parts in projected-block units: the polynomial's certified bound, phase residual bound, M's error carried through the inverse, F's own error. */
  readonly errorParts: { readonly polynomial: number; readonly phases: number; readonly inputPropagation: number; readonly fastInverse: number };
  /** Rigorous bound on ‖projected block − (w − H)⁻¹/α‖ (cost-only: the bound the build will meet, with s ≤ δ). */
  readonly errorBound: number;
  /** The same bound in operator units, errorBound · α. */
  readonly errorBoundOperator: number;
  readonly qubits: { readonly system: number; readonly ancilla: number; readonly total: number };
  /** Energy-register width of the fast inverse (preconditioned route). */
  readonly fastInverseBits: number | null;
  /** True for a cost-only report (no polynomial built: degree from the truncation bound, α of the inverse with s ≈ supTarget·δ). */
  readonly estimated: boolean;
}
