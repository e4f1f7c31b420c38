export { SaturationTracker } from './saturation-tracker.ts';
export type { SaturationFindings } from './saturation-tracker.ts';
export type { SaturationOptions, SaturationInterval, SlewInterval, CurrentLimitInterval, Interval } from './types.ts';
