/**
 * voltcast core: circuit files, modified nodal analysis, trapezoidal transient analysis,
 * frequency response and loop stability, noise, op-amp macro-model and ADC prediction. No file
 * system or process access: runs in Node, a worker or a browser. The host supplies file
 * contents through `readFile` callbacks.
 *
 * This is the whole public surface: reading a circuit, running it, what a run returns, its
 * frequency response, envelopes and compare, and the protocols a new part kind or wave
 * implements.
 *
 * @packageDocumentation
 */

// Reading a circuit file or object.
export { readCircuit, parseCircuit, buildCircuit } from './circuit/parse-circuit.ts';
export type { ParseOptions, ReadCircuitResult } from './circuit/parse-circuit.ts';
export type { Circuit, SimulateSettings, Accuracy, RowsSetBy } from './circuit/circuit.ts';
export type { AdcSpec, AdcCoding, AdcRounding, SampleTimes, SamplingSpec } from './circuit/adc-spec.ts';
export { CircuitError, formatIssue } from './reading/issue.ts';
export type { CircuitIssue, SourcePosition } from './reading/issue.ts';

// Numbers with SI prefixes and units.
export { parseQuantity, formatSI } from './units/index.ts';
export type { ParsedQuantity } from './units/index.ts';
export { quantities } from './units/quantity.ts';
export type { Quantity } from './units/quantity.ts';

// Running a circuit, and what a run returns.
export { simulate } from './transient/simulate.ts';
export type { TransientResult, RunStats, SimulateOptions } from './transient/result.ts';
export type { TransientNoise } from './transient/noise-injection.ts';
export type { StepObserver, ObserverContext } from './transient/observer.ts';
export { SimulationError } from './transient/simulation-error.ts';
export { runCircuit } from './analysis/run-circuit.ts';
export type { CircuitRun, RunOptions } from './analysis/run-circuit.ts';
export type { Findings, FindingsOptions, FindingsStats } from './analysis/report/types.ts';
export type { Hint } from './analysis/report/hints.ts';
export type { SaturationInterval, SlewInterval, CurrentLimitInterval, Interval, SaturationOptions } from './analysis/saturation/types.ts';
export type { RingingFinding, RingingOptions, RingingEvent, ReportWarning } from './analysis/ringing/types.ts';
export type { AdcReadout } from './analysis/adc/adc-readout.ts';
export type { AdcReport, ClippedSamples, CodeError, TimeInterval } from './analysis/adc/adc-report.ts';

// Frequency response and loop stability, linearized at the t = 0 operating point.
export { frequencyResponse } from './analysis/response/frequency-response.ts';
export type { FrequencyResponse, ResponseOptions, LoopFinding, ResponseWarning } from './analysis/response/types.ts';
export type { NodeResponse, LoopResponse, ResponsePeak, AmplifierState } from './small-signal/types.ts';
export type { SmallSignalStats } from './small-signal/linearized-circuit.ts';
export type { ResponseSettings } from './circuit/circuit.ts';

// Noise at every recorded node and converter, linearized at the t = 0 operating point.
export { noiseAnalysis } from './analysis/noise/noise-analysis.ts';
export type { NoiseAnalysis, NoiseOptions, NoiseBandUsed, NoiseContribution, OutputNoiseFigures, AdcNoise } from './analysis/noise/types.ts';
export type { NoiseBand } from './circuit/circuit.ts';

// Tolerance envelopes and comparing captures against them.
export { envelope, envelopePlan, runVariants, assembleEnvelope } from './analysis/envelope/envelope.ts';
export type { Envelope, AdcEnvelope, EnvelopeOptions, EnvelopePlan } from './analysis/envelope/envelope.ts';
export type { ToleranceSlot } from './analysis/envelope/varied-circuit.ts';
export { mergeBounds } from './analysis/envelope/fold.ts';
export type { EnvelopeBounds } from './analysis/envelope/fold.ts';
export { compare } from './analysis/envelope/compare.ts';
export type { Trace, EnvelopeTrace, CompareOptions, Comparison, Violation } from './analysis/envelope/compare.ts';
export type { Tolerance, Distribution } from './parts/tolerance.ts';

// Op-amp classes.
export { opampPresets, opampPresetNames } from './parts/opamp-presets.ts';
export type { OpampParameters, OpampPresetName } from './parts/opamp-presets.ts';

// The protocols a part kind or a wave implements (see DEVELOPERS.md), and the built-in ones.
export { partKinds } from './parts/index.ts';
export type { PartKind, PartSpecBase, PinRef, Conditions, Device, Binder, Mna, ComplexMna, GainStage, NoiseSource, StepInfo, Method, Link, OpenPin } from './parts/index.ts';
export type { TolerableValue } from './parts/tolerance.ts';
export { waveKinds } from './waves/index.ts';
export type { Wave, WaveKind } from './waves/wave.ts';
export type { ValueReader, MapReader, ReadContext, NumberLimits } from './reading/reader.ts';
