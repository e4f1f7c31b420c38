export { runCircuit } from './run-circuit.ts';
export type { CircuitRun, RunOptions } from './run-circuit.ts';
