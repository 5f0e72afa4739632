/**
 * CircuitBuilder: declares named qubit and bit registers and appends checked operations,
 * producing an immutable Circuit.
 */
import type { Circuit, Op, Register } from './types.js';
import { validateUnitaryOp } from './internal/validateOps.js';

export class CircuitBuilder {
  private readonly qubitRegisters: Register[] = [];
  private readonly bitRegisters: Register[] = [];
  private readonly ops: Op[] = [];
  private qubitCount = 0;
  private bitCount = 0;

  /** Declares a qubit register and returns the global indices of its qubits. */
  qubits(name: string, size: number): number[] {
    this.checkName(name, size);
    this.qubitRegisters.push({ name, size, offset: this.qubitCount });
    this.qubitCount += size;
    return range(this.qubitCount - size, size);
  }

  /** Declares a classical bit register and returns the global indices of its bits. */
  bits(name: string, size: number): number[] {
    this.checkName(name, size);
    this.bitRegisters.push({ name, size, offset: this.bitCount });
    this.bitCount += size;
    return range(this.bitCount - size, size);
  }

  /** Appends operations (unitary ops are checked against the declared qubits). */
  add(...ops: Op[]): this {
    for (const op of ops) {
      const where = `circuit op ${this.ops.length}`;
      if (op.kind === 'gate' || op.kind === 'call') validateUnitaryOp(op, this.qubitCount, 0, where);
      else if (op.kind === 'measure') {
        this.checkQubit(op.qubit, where);
        if (!Number.isInteger(op.bit) || op.bit < 0 || op.bit >= this.bitCount) throw new RangeError(`${where}: bit ${op.bit} out of range`);
      } else if (op.kind === 'reset') this.checkQubit(op.qubit, where);
      else op.qubits.forEach((q) => this.checkQubit(q, where));
      this.ops.push(op);
    }
    return this;
  }

  measure(qubit: number, bit: number): this {
    return this.add({ kind: 'measure', qubit, bit });
  }

  build(): Circuit {
    return { qubitRegisters: [...this.qubitRegisters], bitRegisters: [...this.bitRegisters], ops: [...this.ops] };
  }

  private checkName(name: string, size: number): void {
    if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(name)) throw new RangeError(`register name "${name}" is not an identifier`);
    if ([...this.qubitRegisters, ...this.bitRegisters].some((r) => r.name === name)) throw new RangeError(`register "${name}" declared twice`);
    if (!Number.isInteger(size) || size < 1) throw new RangeError(`register "${name}": size must be a positive integer`);
  }

  private checkQubit(q: number, where: string): void {
    if (!Number.isInteger(q) || q < 0 || q >= this.qubitCount) throw new RangeError(`${where}: qubit ${q} out of range`);
  }
}

function range(start: number, size: number): number[] {
  return Array.from({ length: size }, (_, k) => start + k);
}

/** Total number of qubits declared by a circuit. */
export function qubitCount(circuit: Circuit): number {
  return circuit.qubitRegisters.reduce((sum, r) => sum + r.size, 0);
}

/** Total number of classical bits declared by a circuit. */
export function bitCount(circuit: Circuit): number {
  return circuit.bitRegisters.reduce((sum, r) => sum + r.size, 0);
}
