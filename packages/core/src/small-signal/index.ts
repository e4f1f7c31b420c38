export { frequencySweep, loopOf } from './frequency-sweep.ts';
export { LinearizedCircuit, type SmallSignalStats } from './linearized-circuit.ts';
export { frequencyGrid } from './frequency-grid.ts';
export type { AmplifierState, FrequencySweep, LoopResponse, NodeResponse, ResponsePeak } from './types.ts';
