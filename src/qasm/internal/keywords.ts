// Words the OpenQASM reader treats specially (statement keywords, modifiers, constants, functions,
// reserved type names); the writer never uses them as gate or register names.

/** Statement-level keywords the reader rejects as unsupported. */
export const UNSUPPORTED_STATEMENTS: ReadonlySet<string> = new Set([
  'if', 'else', 'for', 'while', 'def', 'return', 'let', 'const', 'int', 'uint', 'float', 'angle', 'bool', 'complex',
  'input', 'output', 'box', 'delay', 'extern', 'defcal', 'cal', 'defcalgrammar', 'duration', 'stretch', 'array',
  'break', 'continue', 'end', 'switch', 'case', 'default', 'opaque', 'pragma', 'durationof',
]);

/** Every word that cannot name a gate, register or parameter. */
export const KEYWORDS: ReadonlySet<string> = new Set([
  ...UNSUPPORTED_STATEMENTS,
  'OPENQASM', 'include', 'qubit', 'bit', 'qreg', 'creg', 'gate', 'measure', 'reset', 'barrier', 'ctrl', 'negctrl', 'inv',
  'pow', 'pi', 'tau', 'euler', 'sin', 'cos', 'tan', 'arcsin', 'arccos', 'arctan', 'exp', 'log', 'sqrt', 'mod', 'in', 'im',
  'true', 'false',
]);
