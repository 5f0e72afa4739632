// Internal failure of the OpenQASM reader at a source position; parseQasm turns it into a QasmParseError.

export interface Position {
  readonly line: number;
  readonly column: number;
}

export class QasmProblem extends Error {
  constructor(
    readonly position: Position,
    readonly expected: string,
    readonly detail: string,
  ) {
    super(detail);
  }
}

/** Throws a QasmProblem at `position`. */
export function fail(position: Position, expected: string, detail: string): never {
  throw new QasmProblem(position, expected, detail);
}
