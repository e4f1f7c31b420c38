import type { CircuitIssue, SourcePosition } from './issue.ts';
import type { MapReader, NumberLimits, ValueReader } from './reader.ts';
import { suggestion } from './suggest.ts';
import type { LineIndex, YamlNode } from './yaml-tree.ts';
import type { Quantity } from '../units/quantity.ts';
import { parseQuantity, quantityHint } from '../units/si.ts';
import { formatSI } from '../units/format.ts';

type Path = readonly (string | number)[];

/** Collects the issues of one read and turns node offsets into line and column. */
export class IssueSink {
  readonly issues: CircuitIssue[] = [];
  constructor(private readonly lines?: LineIndex) {}

  /** Where a node starts; absent for empty values and for documents built from objects, which have no text. */
  positionOf(node: YamlNode | undefined): SourcePosition | undefined {
    if (node === undefined || node.offset < 0 || this.lines === undefined) return undefined;
    return this.lines.position(node.offset);
  }

  add(issue: CircuitIssue): void {
    this.issues.push(issue);
  }
}

/** Values at or beyond this size (or at or below its inverse, besides 0) are typing slips, and would overflow the arithmetic. */
const PHYSICAL = 1e100;

/** Longer node names are slips (a pasted block of text), and would fill every message. */
const LONGEST_NAME = 200;

/**
 * A value of the YAML document, read as the circuit format reads values. Failed reads record
 * an issue and return a placeholder, so one pass finds every problem.
 */
export class YamlValue implements ValueReader {
  readonly position?: SourcePosition;
  readonly part?: string;
  private mapReader?: YamlMap;

  constructor(
    protected readonly sink: IssueSink,
    /** The YAML node; undefined stands for a missing value. */
    protected readonly yaml: YamlNode | undefined,
    readonly path: Path,
    /** Used when the node has no position of its own (an empty value: its key's position). */
    fallback?: SourcePosition,
  ) {
    this.position = sink.positionOf(yaml) ?? fallback;
    // Everything under `parts.NAME` belongs to part NAME.
    if (path[0] === 'parts' && path.length >= 2) this.part = String(path[1]);
  }
  kind(): 'map' | 'list' | 'scalar' | 'null' {
    const kind = this.yaml?.kind;
    if (kind === 'map' || kind === 'list') return kind;
    return this.scalar() === null ? 'null' : 'scalar';
  }

  number(quantity: Quantity, limits?: NumberLimits): number {
    const raw = this.scalar();
    if (typeof raw !== 'number' && typeof raw !== 'string') {
      this.fail(`expected a ${quantity.name}, found ${this.describe()}`, quantityHint(quantity));
      return NaN;
    }
    const parsed = parseQuantity(raw, quantity);
    if ('error' in parsed) {
      this.fail(parsed.error, parsed.hint);
      return NaN;
    }
    const size = Math.abs(parsed.value);
    if (size >= PHYSICAL || (size > 0 && size <= 1 / PHYSICAL)) {
      this.fail(`${this.what(quantity)} ${this.source()} is ${size > 1 ? 'beyond' : 'closer to zero than'} any physical value`, `check the exponent: values lie between ${1 / PHYSICAL} and ${PHYSICAL} in size${size > 1 ? '' : ', or write 0'}`);
      return NaN;
    }
    return limits === undefined ? parsed.value : this.checkLimits(parsed.value, quantity, limits);
  }

  /** The value's name for messages: its key (`duration must be ...`) when it has one. */
  private what(quantity: Quantity): string {
    const key = this.path[this.path.length - 1];
    return typeof key === 'string' ? key : quantity.name;
  }

  text(): string {
    const raw = this.scalar();
    if (typeof raw === 'string') return raw;
    if (typeof raw === 'number') return this.source();
    this.fail(`expected text, found ${this.describe()}`, 'write one word or name here, without brackets or braces');
    return '';
  }

  node(): string {
    const raw = this.scalar();
    if (typeof raw !== 'string' && typeof raw !== 'number') {
      this.fail(`expected a node name, found ${this.describe()}`, 'write a name such as in, out or gnd');
      return '';
    }
    const name = typeof raw === 'number' ? this.source() : raw;
    if (name === '') {
      this.fail('a node name cannot be empty', 'write a name such as in, out or gnd');
      return '';
    }
    if (name.length > LONGEST_NAME) {
      this.fail(`node name '${name.slice(0, 40)}…' is ${name.length} characters long`, `node names become CSV column names: keep them to ${LONGEST_NAME} characters`);
      return '';
    }
    if (/[\s,"]/.test(name)) {
      this.fail(`node name '${name}' contains a space, comma or quote`, 'node names become CSV column names: use letters, digits, _, - or .');
      return '';
    }
    return name;
  }

  list(): ValueReader[] {
    if (this.yaml?.kind !== 'list') {
      this.fail(`expected a list like [a, b], found ${this.describe()}`, 'write the items in brackets, separated by commas: [a, b]');
      return [];
    }
    return this.yaml.items.map((item, i) => new YamlValue(this.sink, item, [...this.path, i], this.position));
  }

  map(): MapReader {
    if (this.mapReader === undefined) {
      const isMap = this.yaml?.kind === 'map';
      if (!isMap) this.fail(`expected a map of key: value pairs, found ${this.describe()}`, 'write the keys in braces, { key: value, other: value }, or indented on the lines below');
      this.mapReader = new YamlMap(this.sink, isMap ? this.yaml : undefined, this.path, this.position);
    }
    return this.mapReader;
  }

  fail(message: string, hint?: string): void {
    this.report('error', message, hint);
  }

  warn(message: string, hint?: string): void {
    this.report('warning', message, hint);
  }

  protected report(severity: 'error' | 'warning', message: string, hint?: string, path: Path = this.path, position = this.position): void {
    this.sink.add({ severity, message, hint: hint || undefined, path, part: this.part, position });
  }

  /** The scalar's value, `null` for an empty value, `undefined` for a map or list. */
  private scalar(): unknown {
    if (this.yaml === undefined) return null;
    return this.yaml.kind === 'scalar' ? this.yaml.value : undefined;
  }

  /** The scalar as written (`007`, not 7). */
  private source(): string {
    return this.yaml?.kind === 'scalar' && this.yaml.source !== '' ? this.yaml.source : String(this.scalar());
  }

  /** What the value is, for "expected X, found Y". */
  private describe(): string {
    switch (this.kind()) {
      case 'map':
        return 'a map';
      case 'list':
        return 'a list';
      case 'null':
        return 'nothing';
      default: {
        const raw = this.scalar();
        return typeof raw === 'string' ? `'${raw}'` : String(raw);
      }
    }
  }

  private checkLimits(value: number, quantity: Quantity, limits: NumberLimits): number {
    const unit = quantity.units[0] ?? '';
    const shown = (n: number) => formatSI(n, unit.includes('/') ? '' : unit, 6);
    const found = `found ${this.describe()}`;
    const what = this.what(quantity);
    if (limits.above !== undefined && !(value > limits.above)) {
      this.fail(`${what} must be greater than ${shown(limits.above)}, ${found}`, `write a ${quantity.name} above ${shown(limits.above)}`);
    } else if (limits.min !== undefined && !(value >= limits.min)) {
      this.fail(`${what} must be at least ${shown(limits.min)}, ${found}`, `write a ${quantity.name} of ${shown(limits.min)} or more`);
    } else if (limits.max !== undefined && !(value <= limits.max)) {
      this.fail(`${what} must be at most ${shown(limits.max)}, ${found}`, `write a ${quantity.name} of ${shown(limits.max)} or less`);
    } else if (limits.integer && !Number.isInteger(value)) {
      this.fail(`${what} must be a whole number, ${found}`, 'write it without a fraction, e.g. 12');
    } else {
      return value;
    }
    return NaN;
  }
}

interface Entry {
  readonly key: string;
  readonly keyPosition?: SourcePosition;
  readonly value: YamlNode;
}

/** A map of the document. Keys asked for become known; `finish` reports the others. */
export class YamlMap extends YamlValue implements MapReader {
  private readonly entries = new Map<string, Entry>();
  private readonly children = new Map<string, YamlValue>();
  private readonly known = new Set<string>();
  private finished = false;

  constructor(sink: IssueSink, node: YamlNode | undefined, path: Path, fallback?: SourcePosition) {
    super(sink, node, path, fallback);
    if (this.yaml?.kind === 'map') for (const entry of this.yaml.entries) this.addEntry(entry.key, entry.value);
  }

  override map(): MapReader {
    return this;
  }

  keys(): string[] {
    return [...this.entries.keys()];
  }

  has(key: string): boolean {
    this.known.add(key);
    return this.entries.has(key);
  }

  get(key: string): ValueReader | undefined {
    this.known.add(key);
    const entry = this.entries.get(key);
    if (entry === undefined) return undefined;
    let child = this.children.get(key);
    if (child === undefined) {
      child = new YamlValue(this.sink, entry.value, [...this.path, key], entry.keyPosition);
      this.children.set(key, child);
    }
    return child;
  }

  need(key: string, hint?: string): ValueReader | undefined {
    const value = this.get(key);
    // A stand-in for a value that was not a map (already reported) lacks every key: say nothing more.
    if (value === undefined && this.yaml?.kind === 'map') this.report('error', `missing key '${key}'`, hint, [...this.path, key]);
    return value;
  }

  numberOr(key: string, quantity: Quantity, fallback: number, limits?: NumberLimits): number {
    const value = this.get(key);
    return value === undefined ? fallback : value.number(quantity, limits);
  }

  choiceOr<T extends string>(key: string, choices: readonly T[], fallback: T): T {
    const value = this.get(key);
    if (value === undefined) return fallback;
    const word = value.text();
    if ((choices as readonly string[]).includes(word)) return word as T;
    value.fail(`'${word}' is not one of ${choices.join(', ')}`, suggestion(word, choices, 'choose one of'));
    return fallback;
  }

  allow(...keys: string[]): void {
    for (const key of keys) this.known.add(key);
  }

  finish(): void {
    if (this.finished) return;
    this.finished = true;
    const known = [...this.known];
    for (const entry of this.entries.values()) {
      if (this.known.has(entry.key)) continue;
      this.report('error', `unknown key '${entry.key}'`, suggestion(entry.key, known, 'keys known here'), [...this.path, entry.key], entry.keyPosition ?? this.position);
    }
  }

  private addEntry(keyNode: YamlNode, value: YamlNode): void {
    const keyPosition = this.sink.positionOf(keyNode) ?? this.position;
    const raw = keyNode.kind === 'scalar' ? keyNode.value : keyNode;
    if (typeof raw !== 'string' && typeof raw !== 'number') {
      this.report('error', 'a key must be a plain word', 'write `name: value`', this.path, keyPosition);
      return;
    }
    const key = String(raw);
    const first = this.entries.get(key);
    if (first === undefined) {
      this.entries.set(key, { key, keyPosition, value });
      return;
    }
    const where = first.keyPosition ? ` (first at line ${first.keyPosition.line}, column ${first.keyPosition.column})` : '';
    // Under `parts:` the keys are part names: say so, since that is what the user sees.
    const isPartList = this.path.length === 1 && this.path[0] === 'parts';
    const message = isPartList ? `part name '${key}' is used twice${where}` : `key '${key}' appears twice${where}`;
    const hint = isPartList ? 'give each part its own name' : 'keep one of them';
    this.sink.add({ severity: 'error', message, hint, path: [...this.path, key], part: isPartList ? key : this.part, position: keyPosition });
  }
}
