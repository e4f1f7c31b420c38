import type { Accuracy, Circuit, SimulateSettings } from './circuit.ts';
import { simulateDefaults, type RowsSetBy } from './circuit.ts';
import { CircuitError, type CircuitIssue } from '../reading/issue.ts';
import type { MapReader, ReadContext, ValueReader } from '../reading/reader.ts';
import { IssueSink, YamlValue } from '../reading/yaml-reader.ts';
import { LineIndex, parseYamlTree, treeOf, type YamlNode } from '../reading/yaml-tree.ts';
import { syntaxIssues } from '../reading/yaml-syntax.ts';
import { selectKind } from '../reading/select-kind.ts';
import { readTolerances } from './read-tolerance.ts';
import { checkConnections, nodesInOrder } from './connections.ts';
import { checkOpenPins } from './open-pins.ts';
import { suggestion } from '../reading/suggest.ts';
import { partKind, partKinds } from '../parts/index.ts';
import { readAdcSection } from './read-adc.ts';
import { readResponseSection } from './read-response.ts';
import { readNoiseSection } from './read-noise.ts';
import { checkNoiseBand } from './noise-band.ts';
import type { PartSpecBase } from '../parts/part-kind.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import { ZERO_CELSIUS } from '../units/constants.ts';

export interface ParseOptions extends ReadContext {
  /** Shown in error messages (`file:line:column`). */
  fileName?: string;
}

export interface ReadCircuitResult {
  /** Present when there is no error (warnings may remain). */
  circuit?: Circuit;
  /** Every error and warning found, in document order of discovery. */
  issues: CircuitIssue[];
}

/** What to check when a time gives absurdly many rows or steps. */
const PREFIX_HINT = 'check the prefix: m is milli, u is micro, n is nano';
/** Above this many output rows a run is probably a typo in `output-step`. */
const manyRows = 1e7;
/** Above this many rows or steps a run could not finish (or its rows could not be kept): refused. */
const mostRows = 1e9;
const mostSteps = 1e10;
/** Above this many of the fastest part's timescales in the duration, a run takes minutes or more. */
const manyTimescales = 1e6;

/**
 * Read and validate a circuit file. Never throws on bad input: every problem (YAML syntax,
 * unknown keys, bad values, dangling nodes) is an issue with its line and column. When the
 * YAML itself is broken only the syntax errors are reported, since the rest would mislead.
 */
export function readCircuit(text: string, options: ParseOptions = {}): ReadCircuitResult {
  let tree: YamlNode;
  try {
    tree = parseYamlTree(text);
  } catch (error) {
    return { issues: syntaxIssues(text, error) };
  }
  const result = readDocument(tree, new IssueSink(new LineIndex(text)), options, { line: 1, column: 1 });
  // Every issue read from text has a position: list them top to bottom, as an editor would.
  const at = (issue: CircuitIssue) => (issue.position?.line ?? 0) * 1e6 + (issue.position?.column ?? 0);
  result.issues.sort((a, b) => at(a) - at(b));
  return result;
}

/** Like `readCircuit`, but throws a `CircuitError` carrying every issue when there is an error. */
export function parseCircuit(text: string, options: ParseOptions = {}): Circuit {
  const { circuit, issues } = readCircuit(text, options);
  if (circuit === undefined) throw new CircuitError(issues, options.fileName);
  return circuit;
}

/**
 * Validate a circuit written as a plain object of the file's shape, e.g.
 * `{ circuit: 'demo', parts: { R1: { resistor: '10k', between: ['in', 'gnd'] } }, ... }`.
 * Same checks and messages as for files (issues carry key paths, no positions).
 * Throws a `CircuitError` when there is an error.
 */
export function buildCircuit(description: object, options: ParseOptions = {}): Circuit {
  const { circuit, issues } = readDocument(treeOf(description), new IssueSink(), options, undefined);
  if (circuit === undefined) throw new CircuitError(issues, options.fileName);
  return circuit;
}

function readDocument(tree: YamlNode, sink: IssueSink, context: ReadContext, start: { line: number; column: number } | undefined): ReadCircuitResult {
  const root = new YamlValue(sink, tree, [], start);
  if (root.kind() !== 'map') {
    root.fail(root.kind() === 'null' ? 'the circuit is empty' : 'a circuit must be a map of keys', 'a circuit needs the keys circuit:, parts: and simulate:');
    return { issues: sink.issues };
  }
  const top = root.map();
  const name = readName(top);
  const parts = readParts(top.need('parts', 'list the parts under parts:, e.g. R1: { resistor: 10k, between: [in, out] }'), context);
  const simulate = readSimulate(top.need('simulate', 'write simulate: { duration: 10m }'), fastestPart(parts.specs));
  const recordValue = top.get('record');
  const adcValue = top.get('adc');
  const response = readResponseSection(top.get('response'), parts.specs);
  const noise = readNoiseSection(top.get('noise'));
  top.finish();

  // A converter's sampling adds parts (switch, capacitor) and nodes of its own.
  const adc = readAdcSection(adcValue, nodesInOrder(parts.specs), simulate.duration);
  if (noise !== undefined) checkNoiseBand(top.get('noise'), noise, adc.adcs);
  const specs = [...parts.specs, ...adc.parts];
  const nodes = nodesInOrder(specs);
  const recorded = recordValue === undefined ? nodes : readRecord(recordValue, nodes);
  // With a part unread its pins are unknown, and the connection checks would only mislead.
  // A node an ADC reads (its input, a reference) is used on purpose, as a recorded one is.
  const watched = [...(recordValue === undefined ? [] : recorded), ...adc.adcs.flatMap((a) => [...a.input, a.low, a.high].filter((n) => typeof n === 'string'))];
  if (parts.complete) checkConnections(parts.specs, watched, top.get('parts'), sink);
  // The devices behind this check need every part read without error.
  if (parts.complete && !sink.issues.some((issue) => issue.severity === 'error')) checkOpenPins(specs, simulate, sink);

  if (sink.issues.some((issue) => issue.severity === 'error')) return { issues: sink.issues };
  const circuit: Circuit = { name, parts: specs, simulate, recorded, nodes, adcs: adc.adcs, ...(response !== undefined ? { response } : {}), ...(noise !== undefined ? { noise } : {}) };
  return { circuit, issues: sink.issues };
}

function readName(top: MapReader): string {
  const value = top.need('circuit', 'start the file with circuit: and a name for it');
  const name = value?.text() ?? '';
  if (value !== undefined && value.kind() === 'scalar' && name.trim() === '') value.fail('the circuit name is empty', 'write circuit: and a name');
  return name;
}

/** The parts read; `complete` is false when a part's kind could not be determined. */
function readParts(value: ValueReader | undefined, context: ReadContext): { specs: PartSpecBase[]; complete: boolean } {
  if (value === undefined) return { specs: [], complete: false };
  const map = value.map();
  const specs: PartSpecBase[] = [];
  if (value.kind() === 'map' && map.keys().length === 0) value.fail('the circuit has no parts', 'add parts, e.g. R1: { resistor: 10k, between: [in, out] }');
  for (const name of map.keys()) {
    const spec = readPart(name, map.get(name)!, context);
    if (spec !== undefined) specs.push(spec);
  }
  map.finish();
  return { specs, complete: value.kind() === 'map' && specs.length === map.keys().length };
}

function readPart(name: string, value: ValueReader, context: ReadContext): PartSpecBase | undefined {
  const example = '{ resistor: 10k, between: [in, out] }';
  if (value.kind() !== 'map') {
    value.fail(`part '${name}' must be a map with one kind key`, `for example ${name}: ${example}`);
    return undefined;
  }
  const options = value.map();
  const kind = selectKind(options, partKinds, 'a part', example);
  if (kind === undefined) return undefined;
  const spec = kind.read(name, options.get(kind.key)!, options, context);
  const tolerances = readTolerances(kind, spec, options);
  options.finish();
  return tolerances === undefined ? spec : { ...spec, tolerances };
}

/** The part whose drive changes shape fastest, and its timescale. */
function fastestPart(specs: readonly PartSpecBase[]): { part: string; timescale: number } | undefined {
  let fastest: { part: string; timescale: number } | undefined;
  for (const spec of specs) {
    const timescale = partKind(spec.kind).timescale?.(spec) ?? Infinity;
    if (timescale > 0 && timescale < (fastest?.timescale ?? Infinity)) fastest = { part: spec.name, timescale };
  }
  return fastest;
}

function readSimulate(value: ValueReader | undefined, fastest: { part: string; timescale: number } | undefined): SimulateSettings {
  const keys = value?.map();
  const time = quantities.time;
  const positive = { above: 0 };
  const duration = keys?.need('duration', 'write duration: 10m, the end time of the run')?.number(time, positive) ?? NaN;
  const written = keys?.get('output-step');
  const rows = written === undefined ? defaultRows(duration, fastest) : undefined;
  const outputStep = written?.number(time, positive) ?? rows?.outputStep ?? NaN;
  if (outputStep > duration) written?.fail(`output-step ${formatSI(outputStep, 's')} is longer than the duration ${formatSI(duration, 's')}`, 'make it at most the duration, or leave it out: voltcast then chooses rows that show the fastest stimulus');
  else if (duration / outputStep > mostRows) written?.fail(`output-step ${formatSI(outputStep, 's')} makes ${(duration / outputStep).toExponential(1)} rows, more than a run can write or keep (${mostRows.toExponential()})`, PREFIX_HINT);
  else if (duration / outputStep > manyRows) written?.warn(`output-step ${formatSI(outputStep, 's')} makes ${formatSI(duration / outputStep, '')} rows`, PREFIX_HINT);
  else if (fastest !== undefined && fastest.timescale < duration && outputStep > fastest.timescale / 2) {
    written?.warn(
      `output-step ${formatSI(outputStep, 's')} is longer than half of ${fastest.part}'s ${formatSI(fastest.timescale, 's')} (its shortest period, level or segment): the rows, the CSV and the plot cannot show it (minimum and maximum still come from every step)`,
      `write output-step: ${formatSI(fastest.timescale / simulateDefaults.rowsPerTimescale, 's')} or less, or leave it out for rows chosen to show it`,
    );
  }
  const durationValue = keys?.get('duration');
  if (fastest !== undefined && durationValue !== undefined) checkTimescales(durationValue, duration, fastest);
  const fixedValue = keys?.get('fixed-step');
  const fixedStep = fixedValue?.number(time, positive);
  if (fixedStep !== undefined && fixedStep > duration) fixedValue?.fail(`fixed-step ${formatSI(fixedStep, 's')} is longer than the duration ${formatSI(duration, 's')}`);
  else if (fixedStep !== undefined) refuseEndless(fixedValue!, 'fixed-step', fixedStep, duration);
  const maxStepValue = keys?.get('max-step');
  const maxStep = maxStepValue?.number(time, positive) ?? outputStep;
  if (maxStepValue !== undefined) refuseEndless(maxStepValue, 'max-step', maxStep, duration);
  const settings: SimulateSettings = {
    duration,
    outputStep,
    maxStep,
    fixedStep,
    accuracy: readAccuracy(keys?.get('accuracy')),
    // Above absolute zero; beyond the range parts are rated for the models mean little, but that is the user's call.
    temperature: keys?.numberOr('temperature', quantities.temperature, simulateDefaults.temperature, { above: -ZERO_CELSIUS }) ?? NaN,
    ...(rows?.setBy !== undefined ? { rowsSetBy: rows.setBy } : {}),
  };
  keys?.finish();
  return settings;
}

/** A duration of so many of the fastest part's timescales that the run is long (a warning) or endless (refused). */
function checkTimescales(value: ValueReader, duration: number, fastest: { part: string; timescale: number }): void {
  const timescales = duration / fastest.timescale;
  const hint = `check ${fastest.part}'s frequency and the duration's prefix`;
  const against = `${fastest.part}'s ${formatSI(fastest.timescale, 's')} (its shortest period, level or segment)`;
  if (timescales > mostSteps) value.fail(`the duration ${formatSI(duration, 's')} is ${timescales.toExponential(1)} times ${against}: more steps than a run can finish (${mostSteps.toExponential()})`, hint);
  else if (timescales > manyTimescales) value.warn(`the duration ${formatSI(duration, 's')} is ${formatSI(timescales, '')} times ${against}, and each needs several steps: expect a long run`, hint);
}

/** A step so short against the duration that the run could not finish in any sensible time. */
function refuseEndless(value: ValueReader, key: string, step: number, duration: number): void {
  if (duration / step > mostSteps) value.fail(`${key} ${formatSI(step, 's')} makes ${(duration / step).toExponential(1)} steps, more than a run can finish (${mostSteps.toExponential()})`, PREFIX_HINT);
}

/**
 * Rows when `output-step` is absent: duration / 1000, or finer so that the fastest part's
 * timescale holds `rowsPerTimescale` rows, up to `mostDefaultRows` rows.
 */
function defaultRows(duration: number, fastest: { part: string; timescale: number } | undefined): { outputStep: number; setBy?: RowsSetBy } {
  const plain = duration / simulateDefaults.rowsWhenUnset;
  if (fastest === undefined) return { outputStep: plain };
  const wanted = fastest.timescale / simulateDefaults.rowsPerTimescale;
  if (!(wanted < plain)) return { outputStep: plain };
  const finest = duration / simulateDefaults.mostDefaultRows;
  return { outputStep: Math.max(wanted, finest), setBy: { ...fastest, capped: wanted < finest } };
}

/** `accuracy: { relative, volts, amps }`: each key optional, defaults in `simulateDefaults`. */
function readAccuracy(value: ValueReader | undefined): Accuracy {
  const defaults = simulateDefaults.accuracy;
  if (value === undefined) return defaults;
  const keys = value.map();
  const positive = { above: 0 };
  const accuracy: Accuracy = {
    relative: keys.numberOr('relative', quantities.fraction, defaults.relative, { above: 0, max: 1 }),
    volts: keys.numberOr('volts', quantities.voltage, defaults.volts, positive),
    amps: keys.numberOr('amps', quantities.current, defaults.amps, positive),
  };
  keys.finish();
  return accuracy;
}

function readRecord(value: ValueReader, nodes: readonly string[]): string[] {
  const known = new Set(nodes);
  const recorded: string[] = [];
  for (const item of value.list()) {
    const name = item.node();
    if (name === '') continue;
    if (name === 'gnd') item.fail('gnd is ground, always 0 V: it has no column', 'remove gnd from record:');
    else if (!known.has(name)) item.fail(`record: '${name}' names no node of this circuit`, suggestion(name, nodes, 'nodes'));
    else if (recorded.includes(name)) item.warn(`record: '${name}' is listed twice`, 'remove the repeat');
    else recorded.push(name);
  }
  return recorded;
}
