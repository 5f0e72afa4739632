/**
 * mutateQasm: one OpenQASM-aware mutation of a program — nested or recursive gate definitions, large or odd `pow`,
 * wide `ctrl(n) @`, huge or empty registers, many measure/reset statements, unknown identifiers, out-of-range
 * indices and broken expressions — inserted at a random line or replacing one. Statements name the register `q`
 * (every seed program declares one); the parser must refuse, not crash on, anything that does not fit.
 */
import type { FuzzRandom } from './fuzzRandom.js';
import type { Mutation } from './mutateJson.js';

function repeated(count: number, line: string): string {
  return new Array<string>(count).fill(line).join('\n');
}

/** A chain of gate definitions, each calling the previous one twice: 2^depth primitive gates. */
function doublingChain(depth: number): string {
  const lines = ['gate g0 a { h a; }'];
  for (let k = 1; k <= depth; k++) lines.push(`gate g${k} a { g${k - 1} a; g${k - 1} a; }`);
  lines.push(`g${depth} q[0];`);
  return lines.join('\n');
}

const SNIPPETS: readonly ((random: FuzzRandom) => string)[] = [
  (r) => doublingChain(r.pick([3, 20, 40, 80, 1100])),
  () => 'gate loop a { loop a; }\nloop q[0];',
  () => 'gate outer a { gate inner b { h b; } inner a; }\nouter q[0];',
  () => 'gate twice a { x a; }\ngate twice a { y a; }\ntwice q[0];',
  (r) => `pow(${r.pick(['1e9', '2**60', '1e400', '-3', '0', '0.5', '-0.5', '1/0', 'pi', '9007199254740993'])}) @ ${r.pick(['x', 'h', 'rz(0.3)', 'cx'])} q[0]${r.chance(0.5) ? ', q[1]' : ''};`,
  (r) => `gate user a { h a; t a; }\npow(${r.pick(['1e9', '2**31', '1e15', '-7'])}) @ user q[0];`,
  (r) => `ctrl(${r.pick(['50', '0', '-1', '1e3', '2.5', '1e400'])}) @ x q[0], q[1];`,
  (r) => `negctrl(${r.pick(['30', '2', '-2'])}) @ ctrl(${r.pick(['30', '1'])}) @ x q[0], q[1], q[2];`,
  (r) => `qubit[${r.pick(['40', '64', '1000000', '0', '-1', '2**40', '1e3', '4294967296'])}] big;\nh big[0];`,
  (r) => `bit[${r.pick(['100000', '0', '64', '-2'])}] flags;\nflags[0] = measure q[0];`,
  (r) => repeated(r.pick([100, 5000, 50_000]), r.pick(['reset q[0];', 'measure q[0];', 'h q[0];', 'barrier q;', 'c[0] = measure q[0];'])),
  (r) => `${r.pick(['foo', 'H', 'cnot', 'U3', 'sqrt', 'measure'])} q[0];`,
  (r) => `h ${r.pick(['r[0]', 'q[99]', 'q[-1]', 'q[1e9]', 'q[0.5]', 'q[', 'q[0][0]', 'q[0:1]', 'q[{0,0}]'])};`,
  (r) => `rz(${r.pick(['1+', '()', 'pi/0', '1e400', 'theta', 'sin()', '2**2**2**2**2**2', '-(-(-(1)))', 'nan', '0x1p3', 'ln(0)', 'sqrt(-1)', 'arccos(2)', '1 % 0', '"a"'])}) q[0];`,
  (r) => `rz(${'('.repeat(r.pick([100, 20_000]))}1${')'.repeat(r.pick([100, 20_000]))}) q[0];`,
  (r) => `cx q[0], q[${r.pick(['0', '1', '2'])}];`,
  (r) => `${r.pick(['OPENQASM 2.0;', 'OPENQASM 3.0;', 'include "other.inc";', 'include "stdgates.inc";', 'qubit[2] q;', 'input float theta;', 'if (c[0]) x q[0];', 'for int i in [0:3] { h q[0]; }', 'U(0) q[0];', 'gphase(pi);', 'defcal x q { }', '#pragma x', '/* open comment'])}`,
];

export function mutateQasm(random: FuzzRandom, text: string): Mutation {
  const lines = text.split('\n');
  const snippet = random.pick(SNIPPETS)(random);
  const at = random.int(lines.length + 1);
  const replace = random.chance(0.3) && at < lines.length;
  lines.splice(at, replace ? 1 : 0, snippet);
  const shown = snippet.length > 60 ? `${snippet.slice(0, 57)}…` : snippet;
  return { text: lines.join('\n'), name: `${replace ? 'replace' : 'insert at'} line ${at + 1}: ${JSON.stringify(shown)}` };
}
