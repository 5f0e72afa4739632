// spinBlockRotation: one per-spin orbital rotation applied to both spin blocks (up modes, then down modes) of a model.
import { defineBlock } from '../circuit/defineBlock.js';
import { call } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';

export interface SpinBlocks {
  readonly up: readonly number[];
  readonly down: readonly number[];
}

export interface SpinBlockRotationOptions {
  /** Size of the mode register. Default up.length + down.length. */
  readonly modes?: number;
  /** Block name. Default `<rotation name>_per_spin`. */
  readonly name?: string;
}

/**
 * The block U(V) ⊗ U(V) that applies `rotation` (a U(V) on L modes) to the up modes and to the down modes, so
 * that it equals U(V ⊕ V) of the whole register. Each spin block must be a run of L consecutive modes (as in the
 * lattice presets, CONVENTIONS.md), because a number-conserving rotation on a consecutive run commutes with the
 * Jordan–Wigner strings of the modes below it.
 * @throws RangeError when a block is not L consecutive ascending modes, the blocks overlap or leave the register.
 */
export function spinBlockRotation(rotation: Block, blocks: SpinBlocks, options: SpinBlockRotationOptions = {}): Block {
  const modes = options.modes ?? blocks.up.length + blocks.down.length;
  const L = rotation.qubits;
  for (const [label, run] of [['up', blocks.up], ['down', blocks.down]] as const) {
    const start = run[0] ?? 0;
    if (run.length !== L || run.some((m, k) => m !== start + k) || start < 0 || start + L > modes) {
      throw new RangeError(`spinBlockRotation: the ${label} block must be ${L} consecutive modes inside 0..${modes - 1}`);
    }
  }
  if (blocks.up.some((m) => blocks.down.includes(m))) throw new RangeError('spinBlockRotation: the spin blocks overlap');
  return defineBlock(
    { name: options.name ?? `${rotation.name}_per_spin`, role: `${rotation.name} applied to the spin-up and the spin-down modes`, qubits: modes },
    [call(rotation, blocks.up), call(rotation, blocks.down)],
  );
}
