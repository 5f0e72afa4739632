/**
 * mutateOptions: the command-line options of one fuzz input — for each command, the options it knows with values
 * that should work and values on or past their edges (bad --z, --grid, --precision, --pairs, --shots, --tolerance …).
 * `@OUT` stands for a fresh output folder and `@INPUT` for the input file; the runner substitutes both.
 */
import type { FuzzRandom } from './fuzzRandom.js';

interface OptionSpec {
  readonly flag: string;
  /** Values the command should accept; empty for a switch without a value. */
  readonly good: readonly string[];
  /** Values it should refuse with an InputError (or handle), never crash on. */
  readonly bad: readonly string[];
  readonly required?: boolean;
}

const NUMBER_EDGES = ['', ' ', 'abc', 'NaN', '-1', '0', '-0', '1e400', '1e308', '-1e308', '5e-324', '0x10', '1,2', '∞', '--json'];

const Z: OptionSpec = {
  flag: '--z',
  good: ['0,0.1', '-0.5+0.5i', '1,1', '0.25,0.05'],
  bad: [...NUMBER_EDGES, '0,0', '0,-1', '1e308,1e308', ',', 'i', '1e-320,1e-320', '0,1e-300', '1e300,1e-10', '0,1e12', '1,2,3'],
};
const GRID: OptionSpec = {
  flag: '--grid',
  good: ['-1:1:5', '0:1:2', '-2:2:9'],
  bad: [...NUMBER_EDGES, '1:0:5', '0:1:0', '0:1:1', '0:1:1e9', '0:1:-3', '0:0:3', 'a:b:c', '-1e308:1e308:3', '0:1:2.5', '0:1', '0:1:2:3', '0:1:100000000'],
};
const PRECISION: OptionSpec = {
  flag: '--precision',
  good: ['1e-3', '1e-2', '0.1'],
  bad: [...NUMBER_EDGES, '1', '2', '1e-300', '1e-16', '1e-12'],
};
const TOLERANCE: OptionSpec = { flag: '--tolerance', good: ['1e-10', '1e-6', '1e-8'], bad: [...NUMBER_EDGES, '1', '1e-400', '1e10', '1e-300'] };
const PAIR: OptionSpec = { flag: '--pair', good: ['0,0', '0,1', '1,0'], bad: [...NUMBER_EDGES, '9,9', '-1,0', '0,0,0', '1e9,0', 'a,b', '0,1.5', '4294967296,0'] };
const PAIRS: OptionSpec = {
  flag: '--pairs',
  good: ['0:0', '0:1,1:0', '1:1'],
  bad: [...NUMBER_EDGES, '9:9', '0:0,0:0', '-1:0', '0:0:0', '1e9:0', '0:1.5', '0:0,', ',', ':'],
};
const SHOTS: OptionSpec = { flag: '--shots', good: ['1', '16', '100'], bad: [...NUMBER_EDGES, '1e9', '9007199254740993', '1.5', '1e20', '4294967296', '1000000000000'] };
const SEED: OptionSpec = { flag: '--seed', good: ['0', '7', '4294967295'], bad: [...NUMBER_EDGES, '4294967296', '1.5', '99999999999999999999'] };
const ENERGY: OptionSpec = { flag: '--energy', good: ['-5', '0', '-1.5'], bad: [...NUMBER_EDGES, '1e300'] };
const ROUTE: OptionSpec = { flag: '--route', good: ['preconditioned', 'direct'], bad: ['', 'fast', 'DIRECT', 'preconditioned,direct'] };
const OUT: OptionSpec = { flag: '--out', good: ['@OUT'], bad: ['@INPUT', '', '/proc/polewright-fuzz', '@OUT/a/b/c', '@OUT/\u0000'] };
const JSON_SWITCH: OptionSpec = { flag: '--json', good: [], bad: [] };

export const COMMAND_OPTIONS: Readonly<Record<string, readonly OptionSpec[]>> = {
  exact: [JSON_SWITCH, OUT, { flag: '--eta', good: ['0.1', '0.5'], bad: [...NUMBER_EDGES, '1e-320'] }, GRID, PAIRS, TOLERANCE],
  check: [JSON_SWITCH, TOLERANCE, PRECISION, Z],
  cost: [
    PAIR,
    Z,
    PRECISION,
    ENERGY,
    { flag: '--prep-toffoli', good: ['10', '0'], bad: [...NUMBER_EDGES, '1.5'] },
    { flag: '--toffoli-t', good: ['4', '7'], bad: ['5', '0', '', 'x'] },
    { flag: '--multi-control', good: ['measured', 'clean', 'dirty'], bad: ['x', ''] },
    JSON_SWITCH,
    { flag: '--vary', good: ['interaction=1,2', 'broadening=0.1,0.2'], bad: ['foo=1', 'interaction=', '=1', 'interaction=a', 'interaction=1e308', 'sites=1,100', 'electrons=-1', 'x'] },
    OUT,
  ],
  run: [SHOTS, SEED, JSON_SWITCH],
  estimate: [
    { ...PAIR, required: true },
    Z,
    GRID,
    ROUTE,
    SHOTS,
    SEED,
    PRECISION,
    { flag: '--load-state', good: [], bad: [] },
    JSON_SWITCH,
  ],
  build: [{ ...PAIR, required: true }, { ...Z, required: true }, { ...OUT, required: true }, ROUTE, PRECISION, ENERGY],
  verify: [
    { flag: '--encodes', good: ['@SECOND'], bad: ['@INPUT', '', 'missing.json'], required: true },
    { flag: '--alpha', good: ['1', '2.5'], bad: NUMBER_EDGES },
    { flag: '--system', good: ['q'], bad: ['', 'nope', 'q,q'] },
    { flag: '--signal', good: ['a'], bad: ['', ',', 'q'] },
    { flag: '--clean', good: ['a'], bad: ['', 'q'] },
    { flag: '--part', good: ['A', 'B'], bad: ['C', ''] },
    { flag: '--probes', good: ['1', '8'], bad: [...NUMBER_EDGES, '1e9'] },
    SEED,
    TOLERANCE,
    JSON_SWITCH,
  ],
  demo: [OUT],
};

export interface OptionChoice {
  readonly args: readonly string[];
  /** The options given a value meant to be refused. */
  readonly bad: readonly string[];
}

/** Picks options for `command`: required ones always, others at random; with probability `badRate` each gets a bad value. */
export function mutateOptions(random: FuzzRandom, command: string, badRate: number): OptionChoice {
  const args: string[] = [];
  const bad: string[] = [];
  for (const spec of COMMAND_OPTIONS[command] ?? []) {
    if (spec.required !== true && !random.chance(0.3)) continue;
    if (spec.good.length === 0) {
      args.push(spec.flag);
      continue;
    }
    const useBad = random.chance(badRate);
    const value = useBad ? random.pick(spec.bad) : random.pick(spec.good);
    if (useBad) bad.push(`${spec.flag} ${JSON.stringify(value)}`);
    args.push(spec.flag, value);
  }
  if (random.chance(0.02)) args.push(random.pick(['--unknown', '-x', '--', 'extra-argument', '--help', '--version']));
  return { args, bad };
}
