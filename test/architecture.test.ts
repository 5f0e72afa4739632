// Architecture: imports between src/ stage folders point one way (later stage → earlier) and form no cycle.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../src');

/** Which stage folders each stage may import (besides itself); see DEVELOPERS.md. */
const ALLOWED: Record<string, readonly string[]> = {
  core: [],
  circuit: ['core'],
  linalg: ['core'],
  polynomial: ['core', 'linalg'],
  model: ['core', 'linalg'],
  operators: ['core', 'linalg', 'model'],
  operatorFile: ['core', 'linalg', 'model', 'operators'],
  exact: ['core', 'linalg', 'model', 'operators'],
  blocks: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators'],
  rotations: ['core', 'circuit', 'linalg', 'model'],
  arithmetic: ['core', 'circuit'],
  inversion: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'blocks', 'rotations', 'arithmetic'],
  qsvt: ['core', 'circuit', 'linalg', 'polynomial', 'blocks'],
  sim: ['core', 'circuit', 'arithmetic', 'blocks', 'inversion'],
  resolvent: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt'],
  readout: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt', 'resolvent', 'sim'],
  qasm: ['core', 'circuit'],
  verify: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'operatorFile', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt', 'resolvent', 'sim', 'qasm'],
  cost: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt', 'resolvent'],
  report: ['core', 'linalg', 'model', 'exact'],
  testing: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'operatorFile', 'exact', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt', 'resolvent', 'readout', 'sim', 'qasm', 'verify', 'report', 'cost'],
  cli: ['core', 'circuit', 'linalg', 'polynomial', 'model', 'operators', 'operatorFile', 'exact', 'blocks', 'rotations', 'arithmetic', 'inversion', 'qsvt', 'resolvent', 'readout', 'sim', 'qasm', 'verify', 'report', 'cost'],
};

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sourceFiles(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** Relative imports of a file; type-only imports (erased at run time) only when `withTypes`. */
function importsOf(file: string, withTypes = true): string[] {
  const text = readFileSync(file, 'utf8');
  const found: string[] = [];
  for (const match of text.matchAll(/(import|export)(\s+type)?\s[^'";]*?from\s+'(\.[^']+)'/g)) {
    if (match[2] && !withTypes) continue;
    found.push(resolve(dirname(file), match[3]!.replace(/\.js$/, '.ts')));
  }
  return found;
}

const stageOf = (file: string): string => relative(SRC, file).split('/')[0]!.replace(/\.ts$/, '');

describe('src/ stage folders', () => {
  const files = sourceFiles(SRC);

  it('import only the stages DEVELOPERS.md allows', () => {
    const violations: string[] = [];
    for (const file of files) {
      const from = stageOf(file);
      if (from === 'index') continue;
      for (const target of importsOf(file)) {
        const to = stageOf(target);
        if (to !== from && !(ALLOWED[from] ?? []).includes(to)) violations.push(`${relative(SRC, file)} → ${relative(SRC, target)}`);
      }
    }
    expect(violations).toEqual([]);
  });

  it('form no run-time import cycle between files', () => {
    const graph = new Map(files.map((f) => [f, importsOf(f, false)]));
    const state = new Map<string, 'open' | 'done'>();
    const cycles: string[] = [];
    const visit = (file: string, path: string[]): void => {
      if (state.get(file) === 'done') return;
      if (state.get(file) === 'open') {
        cycles.push([...path.slice(path.indexOf(file)), file].map((f) => relative(SRC, f)).join(' → '));
        return;
      }
      state.set(file, 'open');
      for (const next of graph.get(file) ?? []) visit(next, [...path, file]);
      state.set(file, 'done');
    };
    for (const file of files) visit(file, []);
    expect(cycles).toEqual([]);
  });
});
