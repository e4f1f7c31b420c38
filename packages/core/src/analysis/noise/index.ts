export { noiseAnalysis } from './noise-analysis.ts';
export type { AdcNoise, NoiseAnalysis, NoiseBandUsed, NoiseContribution, NoiseOptions, OutputNoiseFigures } from './types.ts';
