export { FindingsWatch } from './findings.ts';
export { stageShape } from './stage-shape.ts';
export type { StageShape } from './stage-shape.ts';
export { ringingHint, saturationHint } from './hints.ts';
export type { Hint } from './hints.ts';
export { FINDINGS_SCHEMA } from './types.ts';
export type { Findings, FindingsOptions, FindingsStats } from './types.ts';
