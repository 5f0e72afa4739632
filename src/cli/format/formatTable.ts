/**
 * formatTable: a plain-text table with a header, a rule and padded columns, for terminal output.
 */
export function formatTable(header: readonly string[], rows: readonly (readonly string[])[], align: readonly ('left' | 'right')[]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells.map((cell, c) => (align[c] === 'right' ? cell.padStart(widths[c]!) : cell.padEnd(widths[c]!))).join('  ').trimEnd();
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}
