/**
 * voltcast core: circuit files, modified nodal analysis, trapezoidal transient analysis,
 * op-amp macro-model and ADC prediction. No file system or process access: runs in Node,
 * a worker or a browser. The host supplies file contents through `readFile` callbacks.
 *
 * @packageDocumentation
 */
export { readCircuit, parseCircuit, buildCircuit } from './circuit/parse-circuit.ts';
export type { ParseOptions, ReadCircuitResult } from './circuit/parse-circuit.ts';
export type { Circuit, SimulateSettings } from './circuit/circuit.ts';
export { CircuitError, formatIssue } from './reading/issue.ts';
export type { CircuitIssue, SourcePosition } from './reading/issue.ts';
export type { ValueReader, MapReader, ReadContext, NumberLimits } from './reading/reader.ts';

export { parseQuantity, formatSI } from './units/index.ts';
export type { ParsedQuantity } from './units/index.ts';
export { quantities } from './units/quantity.ts';
export type { Quantity } from './units/quantity.ts';

export { partKinds, partKind } from './parts/index.ts';
export { isOpamp } from './parts/opamp.ts';
export type { OpampSpec, OpampStatus, Supply } from './parts/opamp.ts';
export { opampPresets, opampPresetNames } from './parts/opamp-presets.ts';
export type { OpampParameters, OpampPresetName } from './parts/opamp-presets.ts';
export type { StepObserver, ObserverContext } from './transient/observer.ts';
export type { Device, Binder, Mna, StepInfo, Method, Link, PartKind, PartSpecBase, PinRef } from './parts/index.ts';

export { waveKinds, readStimulus } from './waves/index.ts';
export type { Wave, WaveKind } from './waves/wave.ts';

export { simulate } from './transient/simulate.ts';
export { runCircuit } from './analysis/index.ts';
export type { CircuitRun, RunOptions } from './analysis/index.ts';
export { FindingsWatch, FINDINGS_SCHEMA, stageShape, ringingHint, saturationHint } from './analysis/report/index.ts';
export type { Findings, FindingsOptions, FindingsStats, Hint, StageShape } from './analysis/report/index.ts';
export { SaturationTracker } from './analysis/saturation/index.ts';
export type { SaturationFindings, SaturationOptions, SaturationInterval, SlewInterval, CurrentLimitInterval, Interval } from './analysis/saturation/index.ts';
export { findRinging, measureOscillation, spectralPeak, stimulusCorners, RowRecorder, TwoStepGuard } from './analysis/ringing/index.ts';
export type { Oscillation } from './analysis/ringing/index.ts';
export type { RingingFinding, RingingOptions, RingingEvent, ReportWarning, RowWaveforms } from './analysis/ringing/index.ts';
export type { TransientResult, RunStats, SimulateOptions } from './transient/result.ts';
export { SimulationError } from './transient/simulation-error.ts';
export { AdcSampler, Transfer, SeededNoise, SampleSchedule, encode as encodeAdcCode, codeLimits as adcCodeLimits } from './analysis/adc/index.ts';
export type { AdcSpec, AdcCoding, AdcRounding, SampleTimes, SamplingSpec, AdcReadout, AdcReport, ClippedSamples, CodeError, TimeInterval } from './analysis/adc/index.ts';
export { timedSwitch } from './parts/switch.ts';
export type { SwitchSpec, SwitchSchedule } from './parts/switch.ts';

export { envelope, envelopePlan, planVariants, runVariants, assembleEnvelope, describeVariant, EnvelopeFold, foldFor, toleranceSlots, variedCircuit, compare, estimateDelay } from './analysis/envelope/index.ts';
export type { Envelope, AdcEnvelope, EnvelopeOptions, EnvelopePlan, EnvelopeBounds, ToleranceSlot, Trace, EnvelopeTrace, CompareOptions, Comparison, Violation } from './analysis/envelope/index.ts';
export type { Tolerance, TolerableValue, Distribution } from './parts/tolerance.ts';
export { distributions } from './parts/tolerance.ts';
