export { findRinging } from './find-ringing.ts';
export type { RowWaveforms } from './find-ringing.ts';
export { stimulusCorners, clusterEvents } from './events.ts';
export { oscillationFigures } from './oscillation.ts';
export type { Oscillation } from './oscillation.ts';
export { spectralPeak } from './spectral-peak.ts';
export { RowRecorder } from './row-recorder.ts';
export { TwoStepGuard } from './two-step-guard.ts';
export type { RingingFinding, RingingOptions, RingingEvent, ReportWarning } from './types.ts';
