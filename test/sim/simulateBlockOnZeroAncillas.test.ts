// simulateBlockOnZeroAncillas: leaving idle work qubits out of the state gives the full simulation's amplitudes
// (and zeros wherever an elided qubit is 1) for fast inverses alone, in products and linear combinations, repeated
// (powered) and controlled; qubits that a gate touches are kept; the uncompiled reference path (compile: false) streams
// the same amplitudes with nothing left out.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ancillaQubits, type BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import { adjointEncoding } from '../../src/blocks/combine/adjointEncoding.js';
import { controlledEncoding } from '../../src/blocks/combine/controlledEncoding.js';
import { linearCombination } from '../../src/blocks/combine/linearCombination.js';
import { productEncoding } from '../../src/blocks/combine/productEncoding.js';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { call, gate } from '../../src/circuit/ops.js';
import type { Block } from '../../src/circuit/types.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';
import { prepareBlockOnZeroAncillas, simulateBlockOnZeroAncillas } from '../../src/sim/simulateBlockOnZeroAncillas.js';
import { hermitianArb } from '../inversion/helpers/referenceResolvent.js';

/** max over full basis indices of |reduced amplitude − full amplitude| (0 for the reduced state where an elided bit is set). */
function compare(block: Block, system: number, seed: number): { gap: number; elided: number } {
  const idleZero = Array.from({ length: block.qubits - system }, (_, k) => system + k);
  const dim = 2 ** system;
  const inputRe = Array.from({ length: dim }, (_, u) => Math.sin(seed + 1.7 * u));
  const inputIm = Array.from({ length: dim }, (_, u) => Math.cos(seed + 0.9 * u));
  const { state, prepared } = simulateBlockOnZeroAncillas(block, { re: inputRe, im: inputIm }, { idleZero });
  const fullRe = new Float64Array(2 ** block.qubits);
  const fullIm = new Float64Array(2 ** block.qubits);
  fullRe.set(inputRe);
  fullIm.set(inputIm);
  const full = StateVector.fromAmplitudes(fullRe, fullIm);
  applyUnitaryOps(full, [call(block, Array.from({ length: block.qubits }, (_, k) => k))]);
  let gap = 0;
  for (let i = 0; i < full.re.length; i++) {
    const s = prepared.stateIndex(i);
    const re = s < 0 ? 0 : state.re[s]!;
    const im = s < 0 ? 0 : state.im[s]!;
    gap = Math.max(gap, Math.hypot(re - full.re[i]!, im - full.im[i]!));
  }
  return { gap, elided: prepared.elided.length };
}

const wArb = fc.record({ re: fc.double({ min: -1, max: 1, noNaN: true }), im: fc.double({ min: 0.2, max: 1, noNaN: true }) });
const optionsArb = fc.record({ adder: fc.constantFrom('qft' as const, 'ripple' as const), window: fc.boolean() });

function inverseOf(T: ReturnType<typeof hermitianArb> extends fc.Arbitrary<infer M> ? M : never, w: { re: number; im: number }, o: { adder: 'qft' | 'ripple'; window: boolean }): BlockEncoding {
  return fastInverse(T, w, { adder: o.adder, electrons: o.window && T.n > 1 ? [1, T.n - 1] : undefined, maxBits: 2, precision: 0.2 });
}

describe('simulateBlockOnZeroAncillas(block, input, { idleZero })', () => {
  it('equals the full simulation for products, linear combinations, powers and controls of fast inverses', () => {
    const caseArb = fc.integer({ min: 1, max: 2 }).chain((n) =>
      fc.record({ A: hermitianArb(n), B: hermitianArb(n), w: wArb, o: optionsArb, kind: fc.constantFrom('single', 'product', 'combination', 'powered', 'controlled'), seed: fc.integer({ min: 0, max: 99 }) }),
    );
    fc.assert(
      fc.property(caseArb, ({ A, B, w, o, kind, seed }) => {
        const a = inverseOf(A, w, o);
        const b = inverseOf(B, { re: -w.re, im: w.im }, o);
        let encoding: BlockEncoding = a;
        if (kind === 'product') encoding = productEncoding([a, adjointEncoding(b)]);
        if (kind === 'combination') encoding = linearCombination([{ coefficient: { re: 0.6, im: 0.2 }, encoding: a }, { coefficient: { re: -0.3, im: 0 }, encoding: b }], 'a + b');
        if (kind === 'controlled') encoding = controlledEncoding(productEncoding([a, b]));
        let block = encoding.block;
        const system = encoding.systemQubits;
        if (kind === 'powered') {
          // Alternate a call and its inverse under a control, then a plain power: the QSVT pattern.
          const all = Array.from({ length: a.block.qubits }, (_, k) => k + 1);
          block = defineBlock({ name: 'powered', role: 'test', qubits: a.block.qubits + 1 }, [
            gate('h', [0]),
            call(a.block, all, [], { controls: [0], power: 2 }),
            call(a.block, all, [], { inverse: true, power: 3 }),
            gate('ry', [1], [0.4]),
            call(a.block, all, [], { negControls: [0] }),
          ]);
          const { gap } = compare(block, 1 + A.n, seed);
          expect(gap).toBeLessThanOrEqual(1e-12);
          return;
        }
        expect(block.qubits).toBe(system + ancillaQubits(encoding));
        const { gap, elided } = compare(block, system, seed);
        expect(gap).toBeLessThanOrEqual(1e-12);
        // The energy register of every fast inverse is a work qubit only its kernel touches.
        expect(elided).toBeGreaterThan(0);
      }),
      { numRuns: 30, seed: 41 },
    );
  });

  it('keeps an idle qubit that a gate touches, and elides nothing with native kernels off', () => {
    const T = { n: 2, re: new Float64Array([0.3, 0.1, 0.1, -0.7]), im: new Float64Array(4) };
    const inverse = fastInverse(T, { re: 0.1, im: 0.4 }, { maxBits: 3, precision: 0.1 });
    const register = inverse.block.kernelData!.register!;
    const touching = defineBlock({ name: 'touching', role: 'test', qubits: inverse.block.qubits }, [
      call(inverse.block, Array.from({ length: inverse.block.qubits }, (_, k) => k)),
      gate('x', [register[0]!]),
    ]);
    const idleZero = Array.from({ length: inverse.block.qubits - 2 }, (_, k) => 2 + k);
    const kept = prepareBlockOnZeroAncillas(touching, { idleZero }).kept;
    expect(kept).toContain(register[0]);
    expect(kept).not.toContain(register[1]);
    expect(prepareBlockOnZeroAncillas(inverse.block, { idleZero, useNativeKernels: false }).elided).toEqual([]);
  });

  it('with compile: false keeps every qubit and gives the compiled amplitudes (to 1e-12), native kernels on and off', () => {
    fc.assert(
      fc.property(hermitianArb(2), wArb, optionsArb, fc.boolean(), fc.boolean(), (T, w, o, useNativeKernels, inverse) => {
        const encoding = productEncoding([inverseOf(T, w, o), adjointEncoding(inverseOf(T, { re: -w.re, im: w.im }, o))]);
        const idleZero = Array.from({ length: ancillaQubits(encoding) }, (_, k) => encoding.systemQubits + k);
        const compiled = prepareBlockOnZeroAncillas(encoding.block, { idleZero, inverse });
        const streamed = prepareBlockOnZeroAncillas(encoding.block, { idleZero, inverse, compile: false, useNativeKernels });
        expect(streamed.elided).toEqual([]);
        expect(streamed.stateQubits).toBe(encoding.block.qubits);
        expect(compiled.elided.length).toBeGreaterThan(0);
        for (let column = 0; column < 2 ** encoding.systemQubits; column++) {
          const a = compiled.runBasis(column);
          const b = streamed.runBasis(column);
          for (let i = 0; i < b.re.length; i++) {
            const s = compiled.stateIndex(streamed.kept.reduce((index, q, k) => index | (((i >>> k) & 1) << q), 0));
            const re = s < 0 ? 0 : a.re[s]!;
            const im = s < 0 ? 0 : a.im[s]!;
            expect(Math.hypot(re - b.re[i]!, im - b.im[i]!)).toBeLessThanOrEqual(1e-12);
          }
        }
      }),
      { numRuns: 12, seed: 43 },
    );
  });
});
