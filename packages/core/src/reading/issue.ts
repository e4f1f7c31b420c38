/** A place in the circuit file, 1-based as editors show it. */
export interface SourcePosition {
  readonly line: number;
  readonly column: number;
}

/** One thing wrong (or doubtful) in a circuit description. */
export interface CircuitIssue {
  readonly severity: 'error' | 'warning';
  /** What is wrong, in one sentence. */
  readonly message: string;
  /** What to do about it, when there is a standard remedy or a likely intended spelling. */
  readonly hint?: string;
  /** Key path to the value, e.g. `['parts', 'RF', 'resistor']`. */
  readonly path: readonly (string | number)[];
  /** The part the value belongs to, when it belongs to one. */
  readonly part?: string;
  /** Where the value starts in the text; absent for circuits built in code. */
  readonly position?: SourcePosition;
}

/** Thrown by the parser when the description has at least one error; carries every issue found. */
export class CircuitError extends Error {
  constructor(
    readonly issues: readonly CircuitIssue[],
    readonly fileName?: string,
  ) {
    super(issues.filter((i) => i.severity === 'error').map((i) => formatIssue(i, fileName)).join('\n'));
    this.name = 'CircuitError';
  }
}

/** `file:line:column: error: message (part X, at a.b.c)\n  hint` as a compiler would print it. */
export function formatIssue(issue: CircuitIssue, fileName = '<circuit>'): string {
  const where = issue.position ? `${fileName}:${issue.position.line}:${issue.position.column}` : fileName;
  const at = issue.path.length > 0 ? ` at ${issue.path.join('.')}` : '';
  const part = issue.part !== undefined ? ` (part ${issue.part})` : '';
  const hint = issue.hint ? `\n  ${issue.hint}` : '';
  return `${where}: ${issue.severity}: ${issue.message}${part}${at}${hint}`;
}
