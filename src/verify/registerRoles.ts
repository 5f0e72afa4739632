/**
 * registerRoles: which qubit register of a circuit is the system (the operator acts on it), which are signal
 * registers (the projector <0|…|0> of the block-encoding) and which are clean work registers (must come back to |0>).
 * Defaults: the first declared register is the system, every register not named otherwise is a signal register.
 */
import type { Circuit, Register } from '../circuit/types.js';
import { InputError } from '../core/InputError.js';

export interface RegisterRoleNames {
  /** The register the operator acts on (default: the first declared). */
  readonly system?: string;
  /** Registers projected on |0> (default: every register that is neither the system nor clean). */
  readonly signal?: readonly string[];
  /** Work registers that must return to |0>; part of the projector too, and checked separately. */
  readonly clean?: readonly string[];
}

export interface RegisterRoles {
  readonly system: Register;
  readonly signal: readonly Register[];
  readonly clean: readonly Register[];
}

/** @throws InputError naming the register: unknown, given two roles, or left without a role. */
export function registerRoles(circuit: Circuit, names: RegisterRoleNames = {}): RegisterRoles {
  const registers = circuit.qubitRegisters;
  if (registers.length === 0) throw new InputError('the circuit declares no qubit register');
  const declared = registers.map((r) => `'${r.name}'`).join(', ');
  const find = (name: string, role: string): Register => {
    const found = registers.find((r) => r.name === name);
    if (found === undefined) throw new InputError(`${role} register '${name}' is not declared in the circuit (its qubit registers: ${declared})`);
    return found;
  };
  const system = names.system === undefined ? registers[0]! : find(names.system, 'system');
  const clean = (names.clean ?? []).map((name) => find(name, 'clean'));
  const given = names.signal?.map((name) => find(name, 'signal'));
  const roleOf = new Map<Register, string>([[system, 'the system']]);
  for (const [list, role] of [[clean, 'a clean'], [given ?? [], 'a signal']] as const) {
    for (const register of list) {
      const earlier = roleOf.get(register);
      if (earlier !== undefined) throw new InputError(`register '${register.name}' is named both ${earlier} and ${role} register`);
      roleOf.set(register, role);
    }
  }
  const signal = given ?? registers.filter((r) => !roleOf.has(r));
  const unassigned = registers.filter((r) => !roleOf.has(r) && !signal.includes(r));
  if (unassigned.length > 0) {
    throw new InputError(`register '${unassigned[0]!.name}' is neither the system, a signal nor a clean register: list it under signal (--signal) or clean (--clean)`);
  }
  return { system, signal, clean };
}
