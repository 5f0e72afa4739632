// nonUnitaryLines: the source line of every measure and reset op an OpenQASM 3 text produces, in op order, found by
// scanning the text (comments blanked) for `measure` and `reset` statements and expanding a whole-register operand to
// one op per qubit. Used only to name the line of a refused statement.
import type { Register } from '../../circuit/types.js';

/** Replaces comments by spaces, keeping newlines (so offsets and line numbers stay put). */
function blankComments(text: string): string {
  return text.replace(/\/\/[^\n]*|\/\*[\s\S]*?\*\//g, (comment) => comment.replace(/[^\n]/g, ' '));
}

/** Line numbers (1-based), one per measure or reset op, in the order the reader emits them. */
export function nonUnitaryLines(text: string, registers: readonly Register[]): number[] {
  const plain = blankComments(text);
  const lines: number[] = [];
  for (const match of plain.matchAll(/\b(?:measure|reset)\s+([A-Za-z_][A-Za-z0-9_]*)\s*(\[)?/g)) {
    const line = plain.slice(0, match.index).split('\n').length;
    const size = match[2] === '[' ? 1 : (registers.find((r) => r.name === match[1])?.size ?? 1);
    for (let k = 0; k < size; k++) lines.push(line);
  }
  return lines;
}
