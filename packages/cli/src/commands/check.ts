import { readCircuitFile } from '../read-circuit-file.ts';

/** `voltcast check FILE`: validate only; prints warnings and a one-line verdict. */
export function checkCommand(file: string): void {
  const { circuit, fileName, warnings } = readCircuitFile(file);
  for (const warning of warnings) console.error(warning);
  const count = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;
  console.log(
    `${fileName}: ok (${circuit.name}: ${count(circuit.parts.length, 'part')}, ` +
      `${count(circuit.nodes.length, 'node')}, ${count(circuit.recorded.length, 'recorded node')})`,
  );
}
