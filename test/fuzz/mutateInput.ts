/**
 * mutateInput: the seeded fuzz corpus for the `polewright` CLI. From the seed files in circuits/ (model JSON and
 * OpenQASM programs) it builds input number `index` of corpus `corpusSeed`: a command, its arguments and the mutated
 * file(s) it reads, stacking one to three JSON-aware, OpenQASM-aware or text-level mutations and option mutations.
 * The same (corpusSeed, index) always gives the same input, so any input can be regenerated alone.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fuzzRandom, type FuzzRandom } from './fuzzRandom.js';
import { mutateJson } from './mutateJson.js';
import { mutateOptions } from './mutateOptions.js';
import { mutateQasm } from './mutateQasm.js';
import { mutateText } from './mutateText.js';

export interface SeedFile {
  readonly name: string;
  readonly kind: 'json' | 'qasm';
  readonly text: string;
}

export interface FuzzSeeds {
  /** Files the commands read whole: every model JSON file and the OpenQASM programs small enough to simulate quickly. */
  readonly json: readonly SeedFile[];
  readonly qasm: readonly SeedFile[];
  /** Every seed file, the large generated programs included: material for splicing. */
  readonly donors: readonly SeedFile[];
}

export interface FuzzInput {
  readonly index: number;
  readonly command: string;
  /** Arguments after the command name; `@INPUT`, `@SECOND` and `@OUT` are the runner's file and folder. */
  readonly args: readonly string[];
  /** Text of the file given as the command's argument (`@INPUT`), when it has one. */
  readonly input?: { readonly extension: string; readonly text: string };
  /** Text of the operator file given to `verify --encodes` (`@SECOND`). */
  readonly second?: string;
  /** What was done to the seed, for the report. */
  readonly description: readonly string[];
}

/** OpenQASM seeds above this size (the generated 19-qubit readout circuits) take minutes to simulate: donors only. */
const LARGEST_RUN_SEED = 8192;

export function loadFuzzSeeds(folder: string): FuzzSeeds {
  const files: SeedFile[] = [];
  const visit = (dir: string): void => {
    for (const entry of readdirSync(dir).sort()) {
      const path = join(dir, entry);
      if (statSync(path).isDirectory()) visit(path);
      else if (entry.endsWith('.json') || entry.endsWith('.qasm')) {
        files.push({ name: relative(folder, path), kind: entry.endsWith('.json') ? 'json' : 'qasm', text: readFileSync(path, 'utf8') });
      }
    }
  };
  visit(folder);
  return {
    json: files.filter((f) => f.kind === 'json'),
    qasm: files.filter((f) => f.kind === 'qasm' && f.text.length <= LARGEST_RUN_SEED),
    donors: files,
  };
}

/** A mutation that would make the file longer than this (stacked huge arrays, repeated lines) is dropped. */
const LARGEST_INPUT = 16 * 2 ** 20;

/** Command mix of the corpus; `demo` takes no file and runs for minutes, so the runner adds it only on request. */
const COMMAND_WEIGHTS: readonly (readonly [string, number])[] = [
  ['run', 30],
  ['exact', 20],
  ['cost', 15],
  ['check', 10],
  ['estimate', 10],
  ['build', 8],
  ['verify', 7],
];

function pickCommand(random: FuzzRandom, commands: ReadonlySet<string>): string {
  const weights = COMMAND_WEIGHTS.filter(([name]) => commands.has(name));
  let ticket = random.int(weights.reduce((sum, [, w]) => sum + w, 0));
  for (const [name, weight] of weights) {
    if (ticket < weight) return name;
    ticket -= weight;
  }
  throw new RangeError('pickCommand: no fuzzable command is registered');
}

function mutateFile(random: FuzzRandom, seeds: FuzzSeeds, seed: SeedFile, description: string[]): string {
  let text = seed.text;
  const rounds = random.chance(0.1) ? 0 : 1 + random.int(3);
  for (let k = 0; k < rounds; k++) {
    const donor = random.pick(seeds.donors).text;
    const choice = random.int(10);
    const mutation =
      choice < 5 ? (seed.kind === 'json' ? mutateJson(random, text) : mutateQasm(random, text)) : mutateText(random, text, donor);
    if (mutation.text.length > LARGEST_INPUT) continue;
    text = mutation.text;
    description.push(mutation.name);
  }
  return text;
}

/**
 * Input `index` of the corpus `corpusSeed` for the commands in `commands` (those the program registers).
 * Throws RangeError when no known fuzzable command is among them.
 */
export function mutateInput(seeds: FuzzSeeds, corpusSeed: number, index: number, commands: ReadonlySet<string>): FuzzInput {
  const random = fuzzRandom(corpusSeed, index);
  const command = pickCommand(random, commands);
  const wantsQasm = command === 'run' || command === 'verify';
  // A few inputs give a command the other kind of file.
  const pool = random.chance(0.03) !== wantsQasm ? seeds.qasm : seeds.json;
  const seed = random.pick(pool);
  const description = [`seed ${seed.name}`];
  const text = mutateFile(random, seeds, seed, description);
  const options = mutateOptions(random, command, random.chance(0.5) ? 0.4 : 0);
  if (options.bad.length > 0) description.push(`options ${options.bad.join(' ')}`);
  let inputArg = '@INPUT';
  if (random.chance(0.02)) {
    inputArg = random.pick(['missing.json', '@OUT', '', '-']);
    description.push(`file argument ${JSON.stringify(inputArg)}`);
  }
  const second = command === 'verify' ? mutateFile(random, seeds, random.pick(seeds.json), description) : undefined;
  return {
    index,
    command,
    args: [inputArg, ...options.args],
    input: { extension: seed.kind, text },
    ...(second === undefined ? {} : { second }),
    description,
  };
}
