import { readCircuit } from '../../src/circuit/parse-circuit.ts';
import { formatIssue } from '../../src/reading/issue.ts';

/** Read circuit-file text; its issues formatted as the CLI prints them, for a file named `a.yaml`. */
export function readMessages(text: string) {
  const { circuit, issues } = readCircuit(text);
  return { circuit, messages: issues.map((issue) => formatIssue(issue, 'a.yaml')) };
}
