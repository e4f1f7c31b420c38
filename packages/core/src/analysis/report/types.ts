import type { AdcReport } from '../adc/adc-report.ts';
import type { RingingFinding, RingingOptions, ReportWarning } from '../ringing/types.ts';
import type { CurrentLimitInterval, SaturationInterval, SaturationOptions, SlewInterval } from '../saturation/types.ts';
import type { RunStats } from '../../transient/result.ts';
import type { Hint } from './hints.ts';

/** Version of the findings schema (docs/report-schema.md); raised only when a field changes meaning or goes away. */
export const FINDINGS_SCHEMA = 1;

/** Options of the saturation and ringing analyses. */
export interface FindingsOptions extends SaturationOptions, RingingOptions {}

/**
 * What the saturation and ringing analyses found in one run, with the ADC readers' reports:
 * the object behind `report.json` (docs/report-schema.md). Every number is in SI base units;
 * every list is sorted by time.
 */
export interface Findings {
  readonly schema: typeof FINDINGS_SCHEMA;
  readonly saturation: readonly (SaturationInterval & { readonly hint?: Hint })[];
  readonly slew: readonly SlewInterval[];
  readonly currentLimit: readonly CurrentLimitInterval[];
  readonly ringing: readonly (RingingFinding & { readonly hint?: Hint })[];
  readonly adc: readonly AdcReport[];
  readonly warnings: readonly ReportWarning[];
  readonly stats: FindingsStats;
}

/** The stepper's counters plus what the analyses looked at. */
export interface FindingsStats extends RunStats {
  /** Output rows examined for ringing. */
  readonly rows: number;
  /** Events (corner clusters and rail exits) after which ringing was looked for. */
  readonly events: number;
  /** Nodes examined for ringing: recorded and op-amp outputs. */
  readonly nodes: readonly string[];
}
