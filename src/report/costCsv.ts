/** costCsv: rows of a `cost --vary` sweep as CSV text (header, then one line per parameter value and route). */
export interface CostCsvRow {
  readonly parameter: number;
  readonly route: string;
  readonly values: Readonly<Record<string, number>>;
}

export function costCsv(key: string, columns: readonly string[], rows: readonly CostCsvRow[]): string {
  const lines = [[key, 'route', ...columns].join(',')];
  for (const row of rows) lines.push([String(row.parameter), row.route, ...columns.map((c) => String(row.values[c]))].join(','));
  return `${lines.join('\n')}\n`;
}
