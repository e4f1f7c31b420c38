export type { Circuit, SimulateSettings } from './circuit.ts';
export { simulateDefaults } from './circuit.ts';
export { CircuitError, formatIssue, type CircuitIssue, type SourcePosition } from '../reading/issue.ts';
export type { MapReader, NumberLimits, ReadContext, ValueReader } from '../reading/reader.ts';
export { buildCircuit, parseCircuit, readCircuit, type ParseOptions, type ReadCircuitResult } from './parse-circuit.ts';
export { editDistance, closest } from '../reading/suggest.ts';
