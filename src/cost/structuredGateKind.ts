/**
 * structuredGateKind: the key under which the cost stage counts a gate — its name, positive and negative controls
 * (built-in controls of cx, ccx, cp … included), inverse and power as fields, plus what decomposition needs: the gate's
 * family and how far its (effective) angle and half-angle are from the Clifford group. The OpenQASM-style display
 * string (src/circuit/gateKind.ts) is kept for output only; nothing parses it.
 */
import type { Angle } from '../circuit/angle.js';
import { gateKind } from '../circuit/gateKind.js';
import { standardGate } from '../circuit/standardGates.js';
import { angleLevel, type AngleLevel } from './internal/angleLevel.js';

/**
 * `pauli`: X, Y, Z (integer powers); `phase`: diag(1, e^{iθ}) (p, s, t, z^t …); `rotation`: rx/ry/rz(θ) (and sx, x^t
 * for real t); `hadamard`; `swap`; `swapPower`: swap^t for non-integer t; `gphase`: e^{iθ}; `generic`: any other
 * single-qubit unitary (U, u2, u3, cu, non-integer powers of h); `identity`.
 */
export type GateFamily = 'pauli' | 'phase' | 'rotation' | 'hadamard' | 'swap' | 'swapPower' | 'gphase' | 'generic' | 'identity';

export interface StructuredGateKind {
  /** The standard-gate name as written in the circuit (e.g. "cx", "ry"). */
  readonly name: string;
  /** Positive controls: the gate's built-in ones plus every `ctrl @` gathered on the way down. */
  readonly controls: number;
  /** Negative controls (`negctrl @`). */
  readonly negControls: number;
  readonly inverse: boolean;
  readonly power: number;
  readonly family: GateFamily;
  /** Clifford distance of the effective angle (power applied) and of its half (what a controlled rotation needs). */
  readonly angle: AngleLevel;
  readonly halfAngle: AngleLevel;
  /** The OpenQASM-style display string, e.g. "ctrl(2) @ negctrl @ ry". */
  readonly display: string;
}

const PAULI = new Set(['x', 'y', 'z', 'cx', 'cy', 'cz', 'ccx', 'CX']);
const PHASE = new Set(['p', 'cp', 'cphase', 'phase', 'u1']);
const FIXED_PHASE: Readonly<Record<string, number>> = { s: Math.PI / 2, sdg: -Math.PI / 2, t: Math.PI / 4, tdg: -Math.PI / 4 };
const ROTATION = new Set(['rx', 'ry', 'rz', 'crx', 'cry', 'crz']);
const GENERIC = new Set(['U', 'u2', 'u3', 'cu']);

/** Family and effective angle (null: symbolic, or not an angle gate). */
function classify(name: string, params: readonly Angle[], power: number): { family: GateFamily; angle: number | null } {
  const integer = Number.isInteger(power);
  const numeric = (k: number): number | null => (typeof params[k] === 'number' ? (params[k] as number) * power : null);
  if (name === 'id') return { family: 'identity', angle: null };
  if (PAULI.has(name)) {
    if (integer) return { family: Math.abs(power) % 2 === 0 ? 'identity' : 'pauli', angle: null };
    const zLike = name === 'z' || name === 'cz';
    return { family: zLike ? 'phase' : 'generic', angle: Math.PI * power };
  }
  if (PHASE.has(name)) return { family: 'phase', angle: numeric(0) };
  if (name in FIXED_PHASE) return { family: 'phase', angle: (FIXED_PHASE[name] as number) * power };
  if (ROTATION.has(name)) return { family: 'rotation', angle: numeric(0) };
  if (name === 'sx') return { family: 'rotation', angle: (Math.PI / 2) * power };
  if (name === 'h' || name === 'ch') {
    if (integer) return { family: Math.abs(power) % 2 === 0 ? 'identity' : 'hadamard', angle: null };
    return { family: 'generic', angle: null };
  }
  if (name === 'swap' || name === 'cswap') {
    if (integer) return { family: Math.abs(power) % 2 === 0 ? 'identity' : 'swap', angle: null };
    return { family: 'swapPower', angle: Math.PI * power };
  }
  if (name === 'gphase') return { family: 'gphase', angle: numeric(0) };
  if (GENERIC.has(name)) return { family: 'generic', angle: null };
  throw new RangeError(`structuredGateKind: "${name}" is not a standard gate`);
}

/**
 * Kinds already made, by name, power, then controls, negative controls, inverse and the two angle levels packed in one
 * integer (family depends on name and power alone): a counter asks for the same few kinds once per gate, ~10^5 times.
 */
const made = new Map<string, Map<number, Map<number, StructuredGateKind>>>();
/** The kindKey of every kind made here, built once: a Map hashes a flat string once, a fresh concatenation every time. */
const keys = new WeakMap<StructuredGateKind, string>();
/** Control counts below this are packed; larger ones (never seen in practice) are not memoised. */
const PACKED_CONTROLS = 2 ** 16;

/**
 * The structured kind of gate `name` with angle parameters `params` under `extraControls` positive and `negControls`
 * negative controls (beyond its built-in ones), inverted or not, raised to `power`. Equal inputs give the same object
 * (kinds are read-only).
 * @throws RangeError for a name that is not a standard gate.
 */
export function structuredGateKind(
  name: string,
  params: readonly Angle[],
  extraControls: number,
  negControls: number,
  inverse: boolean,
  power: number,
): StructuredGateKind {
  const gate = standardGate(name);
  if (!gate) throw new RangeError(`structuredGateKind: "${name}" is not a standard gate`);
  const { family, angle } = classify(name, params, power);
  const level = angleLevel(angle);
  const halfLevel = angleLevel(angle === null ? null : angle / 2);
  return kindOf(name, gate.controls, extraControls, negControls, inverse, power, family, level, halfLevel);
}

/**
 * The kind of the same gate inverted: equal to structuredGateKind(name, params, …, !inverse, power) for the params `kind`
 * was made from (inverting changes neither the family nor the angle levels).
 */
export function invertedKind(kind: StructuredGateKind): StructuredGateKind {
  const builtIn = standardGate(kind.name)!.controls;
  return kindOf(kind.name, builtIn, kind.controls - builtIn, kind.negControls, !kind.inverse, kind.power, kind.family, kind.angle, kind.halfAngle);
}

function kindOf(
  name: string,
  builtInControls: number,
  extraControls: number,
  negControls: number,
  inverse: boolean,
  power: number,
  family: GateFamily,
  level: AngleLevel,
  halfLevel: AngleLevel,
): StructuredGateKind {
  const packable =
    Number.isInteger(extraControls) && Number.isInteger(negControls) && extraControls >= 0 && negControls >= 0 &&
    extraControls < PACKED_CONTROLS && negControls < PACKED_CONTROLS && !Object.is(power, -0);
  if (!packable) return makeKind(name, builtInControls, extraControls, negControls, inverse, power, family, level, halfLevel);
  const packed = ((extraControls * PACKED_CONTROLS + negControls) * 2 + (inverse ? 1 : 0)) * 25 + level * 5 + halfLevel;
  let byPower = made.get(name);
  if (!byPower) made.set(name, (byPower = new Map()));
  let byRest = byPower.get(power);
  if (!byRest) byPower.set(power, (byRest = new Map()));
  let kind = byRest.get(packed);
  if (!kind) {
    kind = makeKind(name, builtInControls, extraControls, negControls, inverse, power, family, level, halfLevel);
    byRest.set(packed, kind);
    keys.set(kind, keyOf(kind));
  }
  return kind;
}

function makeKind(
  name: string,
  builtInControls: number,
  extraControls: number,
  negControls: number,
  inverse: boolean,
  power: number,
  family: GateFamily,
  angle: AngleLevel,
  halfAngle: AngleLevel,
): StructuredGateKind {
  return {
    name,
    controls: builtInControls + extraControls,
    negControls,
    inverse,
    power,
    family,
    angle,
    halfAngle,
    display: gateKind(name, extraControls, negControls, inverse, power),
  };
}

function keyOf(kind: StructuredGateKind): string {
  return `${kind.display}|${kind.angle}${kind.halfAngle}`;
}

/** The map key of a kind: the display string plus the angle levels (two gates with one display may cost differently). */
export function kindKey(kind: StructuredGateKind): string {
  return keys.get(kind) ?? keyOf(kind);
}
