import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { inputErrorMessage } from '../helpers/inputErrorMessage.js';
import { ensureDirectory } from '../../src/core/ensureDirectory.js';
import { writeFileAtomic } from '../../src/core/writeFileAtomic.js';
import { checkFolderReplaceable, topLevelNames, writeFolderAtomic } from '../../src/core/writeFolderAtomic.js';

const scratch = () => mkdtempSync(join(tmpdir(), 'polewright-atomic-'));

describe('atomic output', () => {
  it('ensureDirectory creates missing parents and refuses a path through a file, naming it', () => {
    const root = scratch();
    ensureDirectory(join(root, 'a/b/c'));
    expect(existsSync(join(root, 'a/b/c'))).toBe(true);
    writeFileSync(join(root, 'file'), 'x');
    expect(inputErrorMessage(() => ensureDirectory(join(root, 'file/sub')))).toContain('is not a folder');
  });

  it('writeFileAtomic leaves no temporary file behind and reports an unwritable path as an input error', () => {
    const root = scratch();
    writeFileAtomic(join(root, 'x/out.txt'), 'hello');
    expect(readFileSync(join(root, 'x/out.txt'), 'utf8')).toBe('hello');
    expect(readdirSync(join(root, 'x'))).toEqual(['out.txt']);
    writeFileSync(join(root, 'blocker'), '');
    expect(inputErrorMessage(() => writeFileAtomic(join(root, 'blocker/out.txt'), 'x'))).toContain('blocker');
  });

  it('writeFolderAtomic replaces the whole folder, so no stale file of an earlier run survives', () => {
    const root = scratch();
    const target = join(root, 'result');
    expect(writeFolderAtomic(target, new Map([['a.json', '1'], ['plots/b.svg', '<svg/>']])).replaced).toBe(false);
    expect(writeFolderAtomic(target, new Map([['a.json', '2']])).replaced).toBe(true);
    expect(readdirSync(target)).toEqual(['a.json']);
    expect(readFileSync(join(target, 'a.json'), 'utf8')).toBe('2');
    expect(readdirSync(root)).toEqual(['result']);
  });

  it('writeFolderAtomic keeps the earlier folder when the new set cannot be written', () => {
    const root = scratch();
    const target = join(root, 'result');
    writeFolderAtomic(target, new Map([['a.json', 'old']]));
    expect(() => writeFolderAtomic(target, new Map([['../escape.txt', 'x']]))).toThrow(RangeError);
    expect(readFileSync(join(target, 'a.json'), 'utf8')).toBe('old');
    expect(readdirSync(root)).toEqual(['result']);
  });

  it('writeFolderAtomic with onlyReplace replaces an earlier run\'s folder but refuses one holding other entries, naming the label', () => {
    const target = join(scratch(), 'out');
    const files = new Map([['a.json', '1'], ['plots/b.svg', '<svg/>']]);
    expect(topLevelNames(files)).toEqual(['a.json', 'plots']);
    writeFolderAtomic(target, files, { onlyReplace: topLevelNames(files) });
    expect(writeFolderAtomic(target, files, { label: '--out', onlyReplace: topLevelNames(files) }).replaced).toBe(true);
    writeFileSync(join(target, 'notes.txt'), 'keep me');
    expect(inputErrorMessage(() => writeFolderAtomic(target, files, { label: '--out', onlyReplace: topLevelNames(files) })))
      .toMatch(/^--out: ".*out" holds files this command does not write \(notes\.txt\)/);
    expect(readFileSync(join(target, 'notes.txt'), 'utf8')).toBe('keep me');
  });

  it('writeFolderAtomic and checkFolderReplaceable report a path with a NUL byte as an input error naming the label (fuzz finding)', () => {
    const root = scratch();
    expect(inputErrorMessage(() => writeFolderAtomic(`${root}/\u0000`, new Map([['a.txt', 'x']]), { label: '--out' })))
      .toMatch(/^--out: ".*\\u0000" is not a valid path: it contains a NUL byte/);
    expect(inputErrorMessage(() => checkFolderReplaceable('a\u0000b', { label: '--out' }))).toMatch(/^--out: .*NUL byte/);
    expect(readdirSync(root)).toEqual([]);
  });
});
