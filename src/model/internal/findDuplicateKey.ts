// findDuplicateKey: the first key repeated inside one JSON object (JSON.parse silently keeps the last one).
import type { JsonErrorLocation } from './locateJsonError.js';

interface Frame {
  readonly keys: Map<string, number> | null;
  /** Next string in this object is a key. */
  expectKey: boolean;
  /** Key under which this container sits in its parent, for the message. */
  readonly path: string;
}

/**
 * Scans valid JSON text (call after JSON.parse succeeded) iteratively — no recursion, so nesting depth
 * cannot overflow the stack — and returns the position of the second occurrence of the first key that
 * repeats within one object, with a reason naming the key, where it first appeared and the enclosing path.
 */
export function findDuplicateKey(text: string): JsonErrorLocation | undefined {
  const stack: Frame[] = [];
  let line = 1;
  let lineStart = 0;
  let lastKey = '';
  for (let at = 0; at < text.length; at++) {
    const c = text[at]!;
    if (c === '\n') {
      line += 1;
      lineStart = at + 1;
    } else if (c === '{' || c === '[') {
      const parent = stack[stack.length - 1];
      const path = parent === undefined ? '' : parent.keys !== null ? join(parent.path, lastKey) : `${parent.path}[]`;
      stack.push({ keys: c === '{' ? new Map() : null, expectKey: c === '{', path });
    } else if (c === '}' || c === ']') {
      stack.pop();
    } else if (c === ',') {
      const top = stack[stack.length - 1];
      if (top?.keys !== null && top !== undefined) top.expectKey = true;
    } else if (c === '"') {
      let end = at + 1;
      while (text[end] !== '"') end += text[end] === '\\' ? 2 : 1;
      const top = stack[stack.length - 1];
      if (top !== undefined && top.keys !== null && top.expectKey) {
        const key = JSON.parse(text.slice(at, end + 1)) as string;
        const first = top.keys.get(key);
        if (first !== undefined) {
          const where = top.path === '' ? 'the top-level object' : `the object at ${top.path}`;
          return { line, column: at - lineStart + 1, reason: `duplicate key "${key}" in ${where} (first given on line ${first})` };
        }
        top.keys.set(key, line);
        top.expectKey = false;
        lastKey = key;
      }
      at = end;
    }
  }
  return undefined;
}

function join(path: string, key: string): string {
  return path === '' ? key : `${path}.${key}`;
}
