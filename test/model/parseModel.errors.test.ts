import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/InputError.js';
import { parseModel } from '../../src/model/parseModel.js';

const base = { modes: 6, electrons: 2 };

/** The InputError message parseModel throws for `input`. */
function messageOf(input: unknown): string {
  try {
    parseModel(input, 'model.json');
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return (error as InputError).message;
  }
  return expect.fail('parseModel accepted the input');
}

describe('parseModel(input, source) rejects bad input with an InputError naming the field', () => {
  it('missing electrons', () => {
    expect(messageOf({ modes: 2 })).toBe('model.json: electrons: required field is missing');
  });

  it('an index out of range', () => {
    expect(messageOf({ ...base, oneBody: [[0, 0, 1], [1, 1, 1], [2, 2, 1], [0, 7, 1]] }))
      .toBe('model.json: oneBody[3][1]: index 7 out of range 0..5');
    expect(messageOf({ ...base, twoBody: [[0, 1, 6, 1, 1]] })).toBe('model.json: twoBody[0][2]: index 6 out of range 0..5');
  });

  it('a non-integer index and a row of the wrong length', () => {
    expect(messageOf({ ...base, oneBody: [[0.5, 0, 1]] })).toMatch(/^model\.json: oneBody\[0\]\[0\]: index 0\.5 is not an integer$/);
    expect(messageOf({ ...base, oneBody: [[0, 0]] })).toMatch(/^model\.json: oneBody\[0\]: expected \[i, j, re\] or \[i, j, re, im\]/);
  });

  it('non-Hermitian T, naming the entries', () => {
    const message = messageOf({ ...base, oneBody: [[0, 1, 1], [1, 0, 2], [3, 3, 0, 1]] });
    expect(message).toContain('model.json: oneBody: not Hermitian: T[0][1] = 1 but conj(T[1][0]) = 2 (from oneBody[0], oneBody[1])');
    expect(message).toContain('model.json: oneBody: not Hermitian: T[3][3] = 1i is not real (from oneBody[2])');
  });

  it('a hopping listed without its h.c. (no implicit h.c.)', () => {
    expect(messageOf({ ...base, oneBody: [[2, 4, -1]] })).toContain('T[2][4] = -1 but conj(T[4][2]) = 0 (from oneBody[0])');
  });

  it('non-Hermitian V, naming the entries', () => {
    // a†2 a†3 a0 a1 = −a†2 a†3 a1 a0, so this pair is anti-Hermitian.
    const message = messageOf({ ...base, twoBody: [[0, 1, 2, 3, 1], [2, 3, 1, 0, 1]] });
    expect(message).toMatch(/^model\.json: twoBody: not Hermitian: .*a†0 a†1 a3 a2.*a†2 a†3 a1 a0.*\(from twoBody\[0\], twoBody\[1\]\)$/);
  });

  it('η ≤ 0', () => {
    expect(messageOf({ ...base, broadening: 0 })).toBe('model.json: broadening: must be ≥ 1e-9, got 0');
    expect(messageOf({ ...base, broadening: -0.1 })).toBe('model.json: broadening: must be ≥ 1e-9, got -0.1');
  });

  it('electrons > modes', () => {
    expect(messageOf({ modes: 2, electrons: 3 })).toBe('model.json: electrons: 3 electrons do not fit in 2 modes');
    expect(messageOf({ lattice: { shape: 'chain', sites: 2, hopping: 1 }, interaction: 1, electrons: 5 }))
      .toBe('model.json: electrons: 5 electrons do not fit in 4 modes');
  });

  it('grid with points < 1, or from ≥ to', () => {
    expect(messageOf({ ...base, grid: { from: -1, to: 1, points: 0 } })).toBe('model.json: grid.points: must be ≥ 1, got 0');
    expect(messageOf({ ...base, grid: { from: 1, to: 1, points: 3 } })).toMatch(/^model\.json: grid: needs from < to/);
  });

  it('unknown keys, at any depth', () => {
    expect(messageOf({ ...base, broadenning: 0.1 })).toBe('model.json: broadenning: unknown key');
    expect(messageOf({ lattice: { shape: 'ring', sites: 4, hoping: 1 }, interaction: 1, electrons: 2 }))
      .toBe('model.json: lattice.hopping: required field is missing\nmodel.json: lattice.hoping: unknown key');
  });

  it('several problems at once, one line each', () => {
    const lines = messageOf({ modes: 2, electrons: 1, broadening: 0, grid: { from: 0, to: 1, points: 0 } }).split('\n');
    expect(lines).toEqual(['model.json: broadening: must be ≥ 1e-9, got 0', 'model.json: grid.points: must be ≥ 1, got 0']);
    const semantic = messageOf({ modes: 2, electrons: 3, oneBody: [[0, 2, 1]], grid: { from: 1, to: 0, points: 2 } }).split('\n');
    expect(semantic).toHaveLength(3);
  });

  it('wrong types and an unknown lattice shape', () => {
    expect(messageOf({ modes: 'two', electrons: 1 })).toBe('model.json: modes: expected number, got "two"');
    expect(messageOf({ modes: 2, electrons: 1.5 })).toBe('model.json: electrons: expected an integer, got 1.5');
    expect(messageOf({ lattice: { shape: 'tube', sites: 4, hopping: 1 }, interaction: 1, electrons: 2 }))
      .toBe('model.json: lattice.shape: expected one of "chain", "ring", "grid", got "tube"');
  });

  it('a number written beyond the double range (1e400 parses to Infinity) is named as such, with the field\'s limit (fuzz finding)', () => {
    const hubbard = JSON.parse('{"lattice":{"shape":"chain","sites":2,"hopping":1e400},"interaction":4,"electrons":2}') as unknown;
    expect(messageOf(hubbard)).toBe(
      'model.json: lattice.hopping: expected a finite number, got a number beyond the double range (±1.8e308) (the field must lie within ±1000000)',
    );
    expect(messageOf({ modes: 2, electrons: 1, oneBody: [[0, 1, -Infinity]] })).toBe(
      'model.json: oneBody[0][2]: expected a finite number, got a number beyond the double range (±1.8e308)',
    );
  });

  it('no recognisable form, mixed forms, or not an object', () => {
    expect(messageOf({ electrons: 1 })).toMatch(/^model\.json: \(top level\): cannot tell the model form/);
    expect(messageOf({ modes: 2, lattice: {}, electrons: 1 })).toMatch(/^model\.json: \(top level\): keys of several model forms/);
    expect(messageOf([1, 2])).toBe('model.json: (top level): expected a JSON object');
  });

  it('a split entry out of range or pointing at a zero entry', () => {
    expect(messageOf({ ...base, split: { oneBodyInB: [[0, 9]] } })).toBe('model.json: split.oneBodyInB[0][1]: index 9 out of range 0..5');
    expect(messageOf({ ...base, split: { oneBodyInB: [[0, 1]] } })).toBe('model.json: split.oneBodyInB[0]: T[0][1] is zero; there is nothing to move');
  });

  it('a value nested too deeply to print, or a huge one, is named without overflowing the stack (fuzz corpus finding)', () => {
    let nested: unknown = 1;
    for (let k = 0; k < 20_000; k++) nested = [nested];
    expect(messageOf({ ...base, electrons: nested })).toBe('model.json: electrons: expected number, got a value nested too deeply to show');
    expect(messageOf({ ...base, electrons: new Array<number>(100_000).fill(0) }).length).toBeLessThan(200);
  });
});
