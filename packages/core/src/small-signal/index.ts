export { frequencySweep, loopOf } from './frequency-sweep.ts';
export { LinearizedCircuit, type SmallSignalStats } from './linearized-circuit.ts';
export { frequencyGrid } from './frequency-grid.ts';
export { noiseSweep, type NoiseGenerator, type NoiseOutput, type NoiseSweep, type NoiseSweepSettings, type OutputNoise } from './noise-sweep.ts';
export type { AmplifierState, FrequencySweep, LoopResponse, NodeResponse, ResponsePeak } from './types.ts';
