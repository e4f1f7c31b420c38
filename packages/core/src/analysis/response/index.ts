export { frequencyResponse } from './frequency-response.ts';
export { marginHint } from './margin-hint.ts';
export type { FrequencyResponse, LoopFinding, ResponseOptions, ResponseWarning } from './types.ts';
