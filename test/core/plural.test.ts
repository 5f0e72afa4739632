// plural: the count and its noun in the right number (English: singular for exactly 1 — common practice).
import { describe, expect, it } from 'vitest';
import { plural } from '../../src/core/plural.js';

describe('plural', () => {
  it('uses the singular only for exactly 1 and the given or default plural form otherwise', () => {
    expect(plural(1, 'state')).toBe('1 state');
    expect(plural(0, 'state')).toBe('0 states');
    expect(plural(2, 'branch', 'branches')).toBe('2 branches');
    expect(plural(1, 'branch', 'branches')).toBe('1 branch');
    expect(plural(1.5, 'qubit')).toBe('1.5 qubits');
  });
});
