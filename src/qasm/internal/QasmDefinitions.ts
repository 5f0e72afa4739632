// The writer's gate definitions: emits one `gate` per distinct (block, part, control signature) in
// dependency order, allocates unique names, and writes op lists the way the IR means them — with the
// compute/action/uncompute scheme that keeps controls and repeats on the action only.
import { standardGate } from '../../circuit/standardGates.js';
import type { Block, UnitaryOp } from '../../circuit/types.js';
import { formatAngle, formatNumber } from './formatAngle.js';
import { KEYWORDS } from './keywords.js';

const IDENTIFIER = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** Which definition of a block: the block itself, or the compute or action part of a conjugated one. */
type Part = 'whole' | 'compute' | 'action';

/** How an op list is written: local qubit names, parameter names, and controls to distribute. */
export interface OpContext {
  readonly qubit: (index: number) => string;
  readonly params: readonly string[];
  readonly controls: readonly string[];
  readonly negControls: readonly string[];
}

function controlPrefix(keyword: string, count: number): string {
  if (count === 0) return '';
  return count === 1 ? `${keyword} @ ` : `${keyword}(${count}) @ `;
}

/** Modifiers in the fixed order ctrl, negctrl, inv, pow (the IR's meaning is inv @ pow(k) @ g). */
function modifiers(controls: number, negControls: number, inverse: boolean, power: number): string {
  return (
    controlPrefix('ctrl', controls) +
    controlPrefix('negctrl', negControls) +
    (inverse ? 'inv @ ' : '') +
    (power !== 1 ? `pow(${formatNumber(power)}) @ ` : '')
  );
}

function statement(prefix: string, gate: string, args: string, operands: readonly string[]): string {
  return `${prefix}${gate}${args}${operands.length > 0 ? ' ' + operands.join(', ') : ''};`;
}

function argumentList(args: readonly string[]): string {
  return args.length > 0 ? `(${args.join(', ')})` : '';
}

export class QasmDefinitions {
  /** Definition texts in emission order (each ends without a newline). */
  readonly texts: string[] = [];
  private readonly taken = new Set<string>(KEYWORDS);
  private readonly byRequest = new Map<Block, Map<string, string>>();
  private readonly byText = new Map<string, string>();
  private readonly special = new Map<Block, boolean>();

  /** Reserves `wanted` (or `wanted_2`, `wanted_3`, …) and returns the name reserved. */
  reserve(wanted: string): string {
    if (!IDENTIFIER.test(wanted)) throw new RangeError(`writeQasm: name "${wanted}" is not an identifier`);
    let name = wanted;
    for (let k = 2; this.taken.has(name) || standardGate(name); k++) name = `${wanted}_${k}`;
    this.taken.add(name);
    return name;
  }

  /** The lines of `ops` written in `ctx` (defining every gate they need first). */
  writeOps(ops: readonly UnitaryOp[], ctx: OpContext): string[] {
    return ops.flatMap((op) => this.writeOp(op, ctx));
  }

  private writeOp(op: UnitaryOp, ctx: OpContext): string[] {
    const controls = [...ctx.controls, ...op.controls.map(ctx.qubit)];
    const negControls = [...ctx.negControls, ...op.negControls.map(ctx.qubit)];
    const qubits = op.qubits.map(ctx.qubit);
    const operands = [...controls, ...negControls, ...qubits];
    const controlled = controls.length + negControls.length > 0;
    if (op.kind === 'gate') {
      const args = argumentList(op.params.map((a) => formatAngle(a, ctx.params)));
      return [statement(modifiers(controls.length, negControls.length, op.inverse, op.power), op.name, args, operands)];
    }
    const block = op.block;
    const args = argumentList(op.args.map((a) => formatAngle(a, ctx.params)));
    const repeatedOrControlled = controlled || Math.abs(op.power) !== 1;
    if (block.body.kind === 'conjugated' && op.power !== 0 && repeatedOrControlled) {
      // Inline form: only the action carries the controls, the inversion and the repeat.
      const compute = this.define(block, 'compute', 0, 0);
      const action =
        controlled && this.needsSpecialisation(block.body.action)
          ? statement(modifiers(0, 0, op.inverse, op.power), this.define(block, 'action', controls.length, negControls.length), args, operands)
          : statement(modifiers(controls.length, negControls.length, op.inverse, op.power), this.define(block, 'action', 0, 0), args, operands);
      return [statement('', compute, args, qubits), action, statement('inv @ ', compute, args, qubits)];
    }
    if (block.body.kind === 'plain' && controlled && op.power !== 0 && this.needsSpecialisation(block.body.ops)) {
      const name = this.define(block, 'whole', controls.length, negControls.length);
      return [statement(modifiers(0, 0, op.inverse, op.power), name, args, operands)];
    }
    const name = this.define(block, 'whole', 0, 0);
    return [statement(modifiers(controls.length, negControls.length, op.inverse, op.power), name, args, operands)];
  }

  /** True when controlling `ops` as a whole would wrongly control some compute part inside. */
  private needsSpecialisation(ops: readonly UnitaryOp[]): boolean {
    return ops.some((op) => {
      if (op.kind !== 'call') return false;
      const block = op.block;
      if (block.body.kind === 'conjugated') return true;
      let answer = this.special.get(block);
      if (answer === undefined) {
        answer = this.needsSpecialisation(block.body.ops);
        this.special.set(block, answer);
      }
      return answer;
    });
  }

  /** Name of the definition of (block, part) with `controls` + `negControls` leading control qubits. */
  private define(block: Block, part: Part, controls: number, negControls: number): string {
    const key = `${part}:${controls}:${negControls}`;
    let table = this.byRequest.get(block);
    if (!table) {
      table = new Map();
      this.byRequest.set(block, table);
    }
    const known = table.get(key);
    if (known !== undefined) return known;
    const suffix = (part === 'whole' ? '' : `_${part}`) + (controls + negControls > 0 ? `_c${controls}n${negControls}` : '');
    const wanted = block.name + suffix;
    const render = this.renderer(block, part, controls, negControls);
    const textKey = `${wanted}\u0000${render('\u0000')}`;
    let name = this.byText.get(textKey);
    if (name === undefined) {
      name = this.reserve(wanted);
      this.byText.set(textKey, name);
      this.texts.push(render(name));
    }
    table.set(key, name);
    return name;
  }

  /** Writes the body once (defining dependencies) and returns the definition text as a function of its name. */
  private renderer(block: Block, part: Part, controls: number, negControls: number): (name: string) => string {
    const params = parameterNames(block.params);
    const [qubitNames, controlNames, negNames] = qubitParameterNames(block.qubits, controls, negControls, params);
    const ctx: OpContext = { qubit: (k) => qubitNames[k] as string, params, controls: controlNames, negControls: negNames };
    const body = block.body;
    let lines: string[];
    let role: string;
    if (body.kind === 'plain') {
      lines = this.writeOps(body.ops, ctx);
      role = block.role;
    } else if (part === 'compute') {
      lines = this.writeOps(body.compute, ctx);
      role = `compute part of ${block.name}`;
    } else if (part === 'action') {
      lines = this.writeOps(body.action, ctx);
      role = `action part of ${block.name}`;
    } else {
      const args = argumentList(params);
      const compute = this.define(block, 'compute', 0, 0);
      const action = this.define(block, 'action', 0, 0);
      lines = [statement('', compute, args, qubitNames), statement('', action, args, qubitNames), statement('inv @ ', compute, args, qubitNames)];
      role = block.role;
    }
    if (controls + negControls > 0) {
      role += ` (${controls} control and ${negControls} negative-control qubits first, distributed to the body; compute parts stay uncontrolled)`;
    }
    const operands = [...controlNames, ...negNames, ...qubitNames];
    const signature = `${argumentList(params)}${operands.length > 0 ? ' ' + operands.join(', ') : ''}`;
    const oneLineRole = role.replace(/\s+/g, ' ').trim();
    return (name) => [`// ${name}: ${oneLineRole}`, `gate ${name}${signature} {`, ...lines.map((l) => `  ${l}`), '}'].join('\n');
  }
}

/** The block's parameter names when they are distinct free identifiers, else p0, p1, …. */
function parameterNames(names: readonly string[]): string[] {
  const usable = names.every((n) => IDENTIFIER.test(n) && !KEYWORDS.has(n)) && new Set(names).size === names.length;
  return usable ? [...names] : names.map((_, k) => `p${k}`);
}

/** Qubit parameter names q0…, c0…, n0…, prefixed with underscores until they avoid the angle parameters. */
function qubitParameterNames(qubits: number, controls: number, negControls: number, params: readonly string[]): [string[], string[], string[]] {
  const avoid = new Set(params);
  for (let prefix = ''; ; prefix += '_') {
    const names = (letter: string, count: number): string[] => Array.from({ length: count }, (_, k) => `${prefix}${letter}${k}`);
    const result: [string[], string[], string[]] = [names('q', qubits), names('c', controls), names('n', negControls)];
    if (!result.flat().some((n) => avoid.has(n))) return result;
  }
}
