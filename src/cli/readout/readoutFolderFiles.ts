/**
 * readoutFolderFiles: the contents of a readout folder — one OpenQASM 3 file per Hadamard test, the bare block-encodings
 * the readout uses (each an OpenQASM 3 file with its operator file and `verify` command), manifest.json with the
 * recombination rule's scales and the encodings' α, registers and commands, and README.txt stating the rule and the
 * commands in words — rendered in memory (writeFolderAtomic writes them).
 */
import { countsToObject, gateCounts } from '../../circuit/gateCounts.js';
import { qubitCount } from '../../circuit/CircuitBuilder.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { writeQasm } from '../../qasm/writeQasm.js';
import type { HadamardTest } from '../../readout/hadamardTests.js';
import type { JsonHeader } from '../format/jsonHeader.js';
import { encodingFolderFiles, type EncodingManifestEntry } from './encodingFolderFiles.js';
import type { ReadoutEncodings } from './readoutEncodings.js';

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

const CONTENTS =
  '"files": Hadamard-test circuits (measured, not block-encodings, so verify does not apply; recombine them by "rule"). ' +
  '"encodings": the bare block-encodings the readout uses, each with its operator file; run its "verify" command in this folder ' +
  '("verifyMode" exhaustive: every system basis column is checked; probe, for circuits too wide for that: seeded random states, ' +
  'so the error found is a lower bound).';

function encodingLines(entries: readonly EncodingManifestEntry[], omitted: ReadoutEncodings['omitted']): string[] {
  const lines = [
    '',
    'The .qasm files above are Hadamard tests (they measure), not block-encodings; `polewright verify` does not apply to',
    'them. The block-encodings the readout uses are written beside them, each with the operator it encodes in an operator',
    'file; run these commands in this folder (exit 0: the file encodes the operator with the stated alpha within the',
    'tolerance; probe mode checks seeded random states, a lower bound on the error):',
  ];
  for (const entry of entries) lines.push('', `${entry.file}: ${entry.encodes}`, `  ${entry.verify}`);
  for (const item of omitted) lines.push('', `${item.stem}.qasm (not written): ${item.encodes}: ${item.reason}`);
  return lines;
}

function readme(info: ReadoutFolderInfo, tests: readonly HadamardTest[], entries: readonly EncodingManifestEntry[], omitted: ReadoutEncodings['omitted']): string {
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
    ...encodingLines(entries, omitted),
    '',
  ];
  return lines.join('\n');
}

/** `header` (jsonHeader of the command that writes the folder) opens manifest.json. */
export function readoutFolderFiles(
  tests: readonly HadamardTest[],
  info: ReadoutFolderInfo,
  header: JsonHeader<Record<string, unknown>>,
  encodings: ReadoutEncodings,
): Map<string, string> {
  const files = new Map<string, string>();
  for (const test of tests) files.set(`${test.name}.qasm`, writeQasm(test.circuit));
  const written = encodingFolderFiles(encodings.encodings);
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
    contents: CONTENTS,
    files: tests.map((t) => ({
      file: `${t.name}.qasm`,
      kind: 'hadamard-test',
      part: t.part,
      component: t.component,
      state: t.stateIndex,
      scale: t.scale,
      qubits: qubitCount(t.circuit),
      gates: countsToObject(gateCounts(t.circuit)),
    })),
    encodings: written.entries,
    encodingsOmitted: encodings.omitted.map((item) => ({ file: `${item.stem}.qasm`, encodes: item.encodes, reason: item.reason })),
  };
  for (const [name, text] of written.files) files.set(name, text);
  files.set('manifest.json', `${JSON.stringify(manifest, null, 2)}\n`);
  files.set('README.txt', readme(info, tests, written.entries, encodings.omitted));
  return files;
}
