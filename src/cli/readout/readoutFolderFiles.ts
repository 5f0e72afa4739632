/**
 * readoutFolderFiles: the contents of a readout folder — one OpenQASM 3 file per Hadamard test, manifest.json with the
 * recombination rule's scales, and README.txt stating the rule in words — rendered in memory (writeFolderAtomic writes
 * them).
 */
import { countsToObject, gateCounts } from '../../circuit/gateCounts.js';
import { qubitCount } from '../../circuit/CircuitBuilder.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { writeQasm } from '../../qasm/writeQasm.js';
import type { HadamardTest } from '../../readout/hadamardTests.js';
import type { JsonHeader } from '../format/jsonHeader.js';

export interface ReadoutFolderInfo {
  readonly model: string;
  readonly pair: readonly [number, number];
  readonly z: ComplexScalar;
  readonly groundEnergy: number;
  readonly route: string;
  readonly precision: number;
  /** What the circuits prepare, e.g. "exact ground state (2 states, averaged)". */
  readonly initialState: string;
  readonly states: number;
}

export const RULE = 'G_ij(z) = sum over files of scale * (2 * P(result = 0) - 1) * (1 for component "re", i for component "im")';

function readme(info: ReadoutFolderInfo, tests: readonly HadamardTest[]): string {
  const [i, j] = info.pair;
  const lines = [
    `Hadamard-test circuits for G_${i}${j}(z) of ${info.model} at z = ${info.z.re} + ${info.z.im}i (${info.route} route).`,
    '',
    `Each .qasm file (OpenQASM 3) prepares the initial state (${info.initialState}), puts the test qubit in |+>,`,
    'applies the block-encoding U of one part controlled by the test qubit (with S-dagger on the test qubit for an "im"',
    'file), then H, and measures only the test qubit into the one classical bit "result".',
    '',
    'To recombine: run each file, estimate P(result = 0), form 2 P - 1, multiply by the file\'s "scale" from',
    'manifest.json, and add up: "re" files give the real part, "im" files the imaginary part of G. The scale is',
    'the sign of the part (+1 particle, -1 hole) times the normalisation alpha of its block-encoding, divided by the',
    `number of initial states averaged over (${info.states}). In symbols: ${RULE}.`,
    `Files: ${tests.map((t) => `${t.name}.qasm`).join(', ')}.`,
    '',
  ];
  return lines.join('\n');
}

/** `header` (jsonHeader of the command that writes the folder) opens manifest.json. */
export function readoutFolderFiles(
  tests: readonly HadamardTest[],
  info: ReadoutFolderInfo,
  header: JsonHeader<Record<string, unknown>>,
): Map<string, string> {
  const files = new Map<string, string>();
  for (const test of tests) files.set(`${test.name}.qasm`, writeQasm(test.circuit));
  const manifest = {
    ...header,
    model: info.model,
    pair: info.pair,
    z: [info.z.re, info.z.im],
    groundEnergy: info.groundEnergy,
    route: info.route,
    precision: info.precision,
    initialState: info.initialState,
    states: info.states,
    rule: RULE,
    files: tests.map((t) => ({
      file: `${t.name}.qasm`,
      part: t.part,
      component: t.component,
      state: t.stateIndex,
      scale: t.scale,
      qubits: qubitCount(t.circuit),
      gates: countsToObject(gateCounts(t.circuit)),
    })),
  };
  files.set('manifest.json', `${JSON.stringify(manifest, null, 2)}\n`);
  files.set('README.txt', readme(info, tests));
  return files;
}
