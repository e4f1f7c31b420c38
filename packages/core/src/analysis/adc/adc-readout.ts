import type { AdcReport } from './adc-report.ts';
import type { AdcSpec } from '../../circuit/adc-spec.ts';

/**
 * The codes one converter returned, one row per reported code: `index` from 0, the `time` of
 * the conversion (the last sample of an averaged group), the converted `volts` (held
 * voltage, averaged like the code) and the `code` in the ADC's coding.
 */
export interface AdcReadout {
  readonly spec: AdcSpec;
  readonly index: Int32Array;
  readonly time: Float64Array;
  readonly volts: Float64Array;
  readonly code: Int32Array;
  readonly report: AdcReport;
}
