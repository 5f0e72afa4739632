import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/InputError.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';

const dir = mkdtempSync(join(tmpdir(), 'polewright-model-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const write = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

const errorOf = (path: string): InputError => {
  try {
    loadModelFile(path);
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('loadModelFile accepted the file');
};

describe('loadModelFile(path)', () => {
  it('reports malformed JSON with line and column', () => {
    const path = write('broken.json', '{\n  "modes": 2,\n  "electrons": 1,,\n}\n');
    expect(errorOf(path).message).toBe(`${path}:3:18: invalid JSON: expected a double-quoted key, found ","`);
  });

  it('reports a truncated file at its end', () => {
    const path = write('cut.json', '{ "modes": 2,\n  "electrons": 1');
    expect(errorOf(path).message).toBe(`${path}:2:17: invalid JSON: expected ',' or '}', found end of input`);
  });

  it('names a missing file', () => {
    const path = join(dir, 'absent.json');
    expect(errorOf(path).message).toBe(`${path}: cannot read the model file: no such file`);
  });

  it('prefixes validation problems with the file name and takes the name from it', () => {
    expect(errorOf(write('bad.json', '{ "modes": 2 }')).message).toBe(`${join(dir, 'bad.json')}: electrons: required field is missing`);
    expect(loadModelFile(write('tiny-model.json', '\uFEFF{ "modes": 1, "electrons": 0 }')).name).toBe('tiny-model');
  });

  it('parses every scenario in circuits/', () => {
    const circuits = fileURLToPath(new URL('../../circuits/', import.meta.url));
    const files = readdirSync(circuits).filter((f) => f.endsWith('.json'));
    expect(files.length).toBeGreaterThanOrEqual(4);
    for (const file of files) {
      const model = loadModelFile(join(circuits, file));
      expect(model.modes, file).toBeLessThanOrEqual(8);
    }
  });
});
