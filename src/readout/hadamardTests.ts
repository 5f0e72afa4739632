/**
 * hadamardTests: every Hadamard test of one G_ij(z) readout — per part (particle, hole), per initial state (one per
 * vector of a degenerate ground level) and per component (re, im) — with the scale s of the rule
 * G_ij(z) = Σ_tests s·(2·P(bit = 0) − 1)·(1 for re, i for im), s = sign · α / (number of states).
 */
import type { Circuit } from '../circuit/types.js';
import type { GreenPart, GreenPartName } from './greenParts.js';
import { hadamardTestCircuit, type TestComponent } from './hadamardTestCircuit.js';
import type { InitialState } from './InitialState.js';

export interface HadamardTest {
  /** File-name stem, e.g. "particle-re" or, with several states, "particle-re-state1". */
  readonly name: string;
  readonly part: GreenPartName;
  readonly component: TestComponent;
  readonly stateIndex: number;
  readonly scale: number;
  readonly circuit: Circuit;
}

export function hadamardTests(parts: readonly GreenPart[], states: readonly InitialState[]): HadamardTest[] {
  if (states.length === 0) throw new RangeError('hadamardTests: no initial state');
  const tests: HadamardTest[] = [];
  for (const part of parts) {
    const scale = (part.sign * part.encoding.alpha) / states.length;
    states.forEach((state, stateIndex) => {
      for (const component of ['re', 'im'] as const) {
        const suffix = states.length > 1 ? `-state${stateIndex}` : '';
        tests.push({
          name: `${part.part}-${component}${suffix}`,
          part: part.part,
          component,
          stateIndex,
          scale,
          circuit: hadamardTestCircuit(part.encoding, state.preparation, component),
        });
      }
    });
  }
  return tests;
}
