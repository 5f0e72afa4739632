/**
 * The `build` command: writes the Hadamard-test circuits of one G_ij(z) as OpenQASM 3 files (particle/hole × re/im, per
 * ground state when the level is degenerate), the bare block-encodings they use (H, A, B, a_i, a†_j, the resolvents and
 * the parts; each with an operator file and its `verify` command), manifest.json (the recombination rule's scales,
 * qubits, gate counts; per encoding α, registers and command) and README.txt, the whole folder atomically. The initial
 * state is the exact ground vector (prepared exactly), or — with --energy E0, for models too large to solve — the Slater
 * determinant of A's lowest orbitals.
 */
import type { Command } from 'commander';
import { InputError, isInputError } from '../../core/InputError.js';
import { totalGates, gateCounts } from '../../circuit/gateCounts.js';
import { qubitCount } from '../../circuit/CircuitBuilder.js';
import { describeModel } from '../../model/describeModel.js';
import type { FermionModel } from '../../model/FermionModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { greenParts } from '../../readout/greenParts.js';
import { hadamardTests } from '../../readout/hadamardTests.js';
import type { InitialState } from '../../readout/InitialState.js';
import { slaterDeterminant } from '../../rotations/slaterDeterminant.js';
import { oneBodyOfA } from '../../inversion/oneBodyOfA.js';
import { formatTable } from '../format/formatTable.js';
import { parseFiniteNumber, parsePositiveNumber } from '../options.js';
import { formatComplex } from '../readout/formatComplex.js';
import { parseComplexZ, parsePair, parseRoute } from '../readout/parseReadoutOptions.js';
import { readoutEncodings } from '../readout/readoutEncodings.js';
import { readoutFolderFiles } from '../readout/readoutFolderFiles.js';
import { routeResolvent } from '../readout/routeResolvent.js';
import { solvedGround } from '../readout/solvedGround.js';
import { plural } from '../../core/plural.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { checkFolderReplaceable, topLevelNames, writeFolderAtomic } from '../../core/writeFolderAtomic.js';

export interface BuildCommandOptions {
  readonly pair: string;
  readonly z: string;
  readonly route: string;
  readonly precision: string;
  readonly energy?: string;
  readonly out: string;
}

const ENERGY_HINT = '; give --energy E0 to build with a Slater-determinant initial state instead';

interface Start {
  readonly energy: number;
  readonly states: readonly InitialState[];
  readonly description: string;
}

/** The exact ground level, or with --energy the Slater determinant of A's N lowest orbitals. */
function startOf(model: FermionModel, energy: number | undefined): Start {
  if (energy !== undefined) {
    const preparation = slaterDeterminant({ oneBody: oneBodyOfA(model) }, model.electrons, { name: 'prepare_slater_state' });
    return {
      energy,
      states: [{ label: 'Slater determinant', preparation }],
      description: `Slater determinant of the ${model.electrons} lowest orbitals of A (not the exact ground state; E0 from --energy)`,
    };
  }
  try {
    return solvedGround(model, ENERGY_HINT);
  } catch (error) {
    if (isInputError(error) && !error.message.endsWith(ENERGY_HINT)) throw new InputError(`${error.message}${ENERGY_HINT}`);
    throw error;
  }
}

/** Runs `polewright build` in-process. */
export function buildCommand(file: string, options: BuildCommandOptions): void {
  const route = parseRoute(options.route);
  const precision = parsePositiveNumber('--precision', options.precision);
  const z = parseComplexZ(options.z);
  checkFolderReplaceable(options.out, { label: '--out' });
  const energy = options.energy === undefined ? undefined : parseFiniteNumber('--energy', options.energy);
  const model = loadModelFile(file);
  const pair = parsePair(options.pair, model.modes);
  const start = startOf(model, energy);
  const resolvent = routeResolvent(model, route, precision);
  const parts = greenParts({ modes: model.modes, electrons: model.electrons, groundEnergy: start.energy, pair, z, resolvent: resolvent.factory });
  const tests = hadamardTests(parts, start.states);
  const encodings = readoutEncodings(model, pair, parts, route);
  const files = readoutFolderFiles(tests, {
    model: model.name,
    pair,
    z,
    groundEnergy: start.energy,
    route,
    precision,
    initialState: start.description,
    states: start.states.length,
  }, jsonHeader('build', { model: file, pair, z: [z.re, z.im], route, precision, energy: energy ?? null, out: options.out }), encodings);
  writeFolderAtomic(options.out, files, { label: '--out', onlyReplace: topLevelNames(files) });
  const table = formatTable(
    ['file', 'part', 'component', 'scale', 'qubits', 'gates'],
    tests.map((t) => [`${t.name}.qasm`, t.part, t.component, t.scale.toPrecision(8), String(qubitCount(t.circuit)), String(totalGates(gateCounts(t.circuit)))]),
    ['left', 'left', 'left', 'right', 'right', 'right'],
  );
  const [i, j] = pair;
  process.stdout.write(
    [
      `model: ${describeModel(model)}`,
      `G_${i}${j}(z) at z = ${formatComplex(z, 6)}, ${route} route, precision ${precision}; E0 = ${start.energy.toPrecision(12)}`,
      `initial state: ${start.description}`,
      table,
      `rule: G = Σ scale·(2·P(result = 0) − 1)·(1 for re, i for im)`,
      `wrote: ${options.out}/ (${plural(tests.length, 'Hadamard-test OpenQASM file')}, ${plural(encodings.encodings.length, 'block-encoding')} with operator files, manifest.json, README.txt)`,
      `check the block-encodings: the "verify" commands in README.txt or manifest.json, run in ${options.out}/`,
      '',
    ].join('\n'),
  );
}

/** Adds `build MODEL --pair i,j --z re,im [--route ...] [--precision ε] [--energy E0] --out DIR` to the program. */
export function registerBuildCommand(program: Command): void {
  program
    .command('build')
    .description('write the Hadamard-test circuits of G_ij(z) as OpenQASM 3 files with a manifest of the recombination rule')
    .argument('<model>', 'model file (JSON)')
    .requiredOption('--pair <i,j>', 'the entry G_ij')
    .requiredOption('--z <re,im>', 'frequency z = ω + iη (η > 0)')
    .requiredOption('--out <dir>', 'output folder (written whole or not at all)')
    .option('--route <route>', 'preconditioned (fast inverse of the one-body part) or direct', 'preconditioned')
    .option('--precision <eps>', 'precision of the resolvent encodings', '1e-6')
    .option('--energy <E0>', 'ground energy: skip the exact solver and prepare a Slater determinant (for models too large to solve)')
    .action((file: string, options: BuildCommandOptions) => buildCommand(file, options));
}
