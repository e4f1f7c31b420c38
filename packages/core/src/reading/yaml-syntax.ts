import { LineCounter, parseDocument, type YAMLError } from 'yaml';
import type { CircuitIssue } from './issue.ts';

/**
 * Issues for text that is not valid YAML. The yaml package reads broken text again for its
 * messages, which name the construct and the place better; if it finds nothing wrong, the
 * fast parser's own message is reported.
 */
export function syntaxIssues(text: string, error: unknown): CircuitIssue[] {
  const hint = 'check the indentation, colons and brackets here and on the line before';
  // The fast parser stops at 100 levels; the second one would recurse until the stack overflows.
  if (error instanceof RangeError || /maxDepth/.test((error as { reason?: string })?.reason ?? '')) return [nestedTooDeeply(text)];
  const lines = new LineCounter();
  const document = parseDocument(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: false });
  const issue = (problem: YAMLError): CircuitIssue => {
    const { line, col } = lines.linePos(problem.pos[0]);
    return { severity: 'error', message: `YAML: ${problem.message}`, hint, path: [], position: { line, column: col } };
  };
  if (document.errors.length > 0) return document.errors.map(issue);
  const mark = (error as { mark?: { line: number; column: number }; reason?: string }) ?? {};
  return [{
    severity: 'error',
    message: `YAML: ${mark.reason ?? String(error)}`,
    hint,
    path: [],
    position: mark.mark ? { line: mark.mark.line + 1, column: mark.mark.column + 1 } : undefined,
  }];
}

/** Deeper than any circuit file needs: the place where the brackets go past it is reported. */
const DEEPEST = 100;

function nestedTooDeeply(text: string): CircuitIssue {
  let depth = 0;
  let line = 1;
  let column = 1;
  let at: { line: number; column: number } | undefined;
  for (const char of text) {
    if (char === '[' || char === '{') depth++;
    else if (char === ']' || char === '}') depth--;
    if (depth > DEEPEST && at === undefined) at = { line, column };
    if (char === '\n') [line, column] = [line + 1, 1];
    else column++;
  }
  return {
    severity: 'error',
    message: `YAML: nested too deeply (more than ${DEEPEST} levels of brackets)`,
    hint: 'a circuit file needs a few levels: look for a run of [ or { brackets',
    path: [],
    position: at,
  };
}
