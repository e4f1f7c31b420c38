import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

// The public API is what an embedder holds on to: a change to this list is a change of the
// package's contract and is made on purpose, here and in the docs.
const entry = fileURLToPath(new URL('../src/index.ts', import.meta.url));

function exportedNames(): string[] {
  const program = ts.createProgram([entry], { allowImportingTsExtensions: true, noEmit: true, module: ts.ModuleKind.NodeNext, moduleResolution: ts.ModuleResolutionKind.NodeNext, target: ts.ScriptTarget.ES2022, noLib: true, types: [] });
  const checker = program.getTypeChecker();
  const module = checker.getSymbolAtLocation(program.getSourceFile(entry)!)!;
  return checker.getExportsOfModule(module).map((symbol) => symbol.getName()).sort();
}

describe('the public surface of @voltcast/core', () => {
  it('exports exactly the embedder API, no internals', () => {
    expect(exportedNames()).toEqual(
      [
        // reading a circuit
        'readCircuit', 'parseCircuit', 'buildCircuit', 'ParseOptions', 'ReadCircuitResult', 'Circuit', 'SimulateSettings', 'Accuracy', 'RowsSetBy',
        'AdcSpec', 'AdcCoding', 'AdcRounding', 'SampleTimes', 'SamplingSpec', 'CircuitError', 'formatIssue', 'CircuitIssue', 'SourcePosition',
        // numbers
        'parseQuantity', 'formatSI', 'ParsedQuantity', 'quantities', 'Quantity',
        // running
        'simulate', 'TransientResult', 'RunStats', 'SimulateOptions', 'TransientNoise', 'StepObserver', 'ObserverContext', 'SimulationError',
        'runCircuit', 'CircuitRun', 'RunOptions', 'Findings', 'FindingsOptions', 'FindingsStats', 'Hint',
        'SaturationInterval', 'SlewInterval', 'CurrentLimitInterval', 'Interval', 'SaturationOptions',
        'RingingFinding', 'RingingOptions', 'RingingEvent', 'ReportWarning', 'AdcReadout', 'AdcReport', 'ClippedSamples', 'CodeError', 'TimeInterval',
        // frequency response
        'frequencyResponse', 'FrequencyResponse', 'ResponseOptions', 'LoopFinding', 'ResponseWarning', 'NodeResponse', 'LoopResponse', 'ResponsePeak',
        'AmplifierState', 'SmallSignalStats', 'ResponseSettings',
        // noise
        'noiseAnalysis', 'NoiseAnalysis', 'NoiseOptions', 'NoiseBandUsed', 'NoiseContribution', 'OutputNoiseFigures', 'AdcNoise', 'NoiseBand',
        // envelopes and compare
        'envelope', 'envelopePlan', 'runVariants', 'assembleEnvelope', 'Envelope', 'AdcEnvelope', 'EnvelopeOptions', 'EnvelopePlan', 'ToleranceSlot',
        'mergeBounds', 'EnvelopeBounds', 'compare', 'Trace', 'EnvelopeTrace', 'CompareOptions', 'Comparison', 'Violation', 'Tolerance', 'Distribution',
        // op-amp classes
        'opampPresets', 'opampPresetNames', 'OpampParameters', 'OpampPresetName',
        // extension protocols
        'partKinds', 'PartKind', 'PartSpecBase', 'PinRef', 'Conditions', 'Device', 'Binder', 'Mna', 'ComplexMna', 'GainStage', 'NoiseSource', 'StepInfo', 'Method', 'Link', 'OpenPin', 'TolerableValue',
        'waveKinds', 'Wave', 'WaveKind', 'ValueReader', 'MapReader', 'ReadContext', 'NumberLimits',
      ].sort(),
    );
  });
});
