// readTextFileLimited: reads a file up to the limit, refuses a larger regular file or an endless device by the limit,
// names the file and the limit, and reports missing files and folders as input errors.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { inputErrorMessage } from '../helpers/inputErrorMessage.js';
import { readTextFileLimited } from '../../src/core/readTextFileLimited.js';

const dir = mkdtempSync(join(tmpdir(), 'polewright-read-'));

describe('readTextFileLimited(path, maxBytes, what)', () => {
  it('returns the whole text of a file at the limit, UTF-8 decoded', () => {
    const path = join(dir, 'exact.txt');
    writeFileSync(path, 'ω = 1\n');
    expect(readTextFileLimited(path, Buffer.byteLength('ω = 1\n'), 'test file')).toBe('ω = 1\n');
  });

  it('refuses a regular file one byte over the limit, naming the file, the kind and the limit', () => {
    const path = join(dir, 'over.txt');
    writeFileSync(path, 'x'.repeat(1025));
    expect(inputErrorMessage(() => readTextFileLimited(path, 1024, 'test file'))).toBe(`${path}: the test file is larger than 1.00 KiB, the most it may be`);
  });

  it('stops reading an endless device (/dev/zero) once the limit is passed', () => {
    expect(inputErrorMessage(() => readTextFileLimited('/dev/zero', 2 ** 20, 'OpenQASM program'))).toMatch(/^\/dev\/zero: the OpenQASM program is larger than 1\.00 MiB/);
  });

  it('reports a missing file and a folder as input errors naming them', () => {
    expect(inputErrorMessage(() => readTextFileLimited(join(dir, 'absent.txt'), 10, 'test file'))).toMatch(/absent\.txt: cannot read the test file: no such file/);
    expect(inputErrorMessage(() => readTextFileLimited(dir, 10, 'test file'))).toMatch(/cannot read the test file: it is a directory/);
  });
});
