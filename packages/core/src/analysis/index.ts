export { runCircuit } from './run-circuit.ts';
export type { CircuitRun, RunOptions } from './run-circuit.ts';
export { frequencyResponse } from './response/index.ts';
export type { FrequencyResponse, ResponseOptions } from './response/index.ts';
export { noiseAnalysis } from './noise/index.ts';
export type { NoiseAnalysis, NoiseOptions } from './noise/index.ts';
