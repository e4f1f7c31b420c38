import type { SourcePosition } from './issue.ts';
import type { Quantity } from '../units/quantity.ts';

/**
 * Read access to one value of the circuit document, with its key path and file position.
 * Every failed read records an issue (what, where, what to do) and returns a placeholder
 * (`NaN`, `''`, `[]`), so that one pass reports every problem in the file at once.
 */
export interface ValueReader {
  readonly path: readonly (string | number)[];
  readonly position?: SourcePosition;
  /** The part this value belongs to, for error messages. */
  readonly part?: string;
  kind(): 'map' | 'list' | 'scalar' | 'null';
  /** A number written plainly or with an SI prefix and the quantity's unit (`10k`, `4.7kΩ`, `13V/us`). */
  number(quantity: Quantity, limits?: NumberLimits): number;
  /** A plain string scalar. */
  text(): string;
  /** A node name: a non-empty string or number scalar; `gnd` is ground. */
  node(): string;
  /** The items of a list (empty, with an issue recorded, when this is not a list). */
  list(): ValueReader[];
  /** This value as a map (an empty one, with an issue recorded, when it is not a map). */
  map(): MapReader;
  /** Record an error at this value. */
  fail(message: string, hint?: string): void;
  /** Record a warning at this value. */
  warn(message: string, hint?: string): void;
}

export interface NumberLimits {
  /** Smallest allowed value (inclusive). */
  readonly min?: number;
  /** Value must be strictly greater than this. */
  readonly above?: number;
  /** Largest allowed value (inclusive). */
  readonly max?: number;
  /** Value must be a whole number. */
  readonly integer?: boolean;
}

/**
 * Read access to a map. Keys read through `get`, `need`, `has` or the typed helpers become
 * known; `finish()` then reports every other key as unknown, with a "did you mean" suggestion.
 */
export interface MapReader extends ValueReader {
  keys(): string[];
  has(key: string): boolean;
  /** The value under `key`, or undefined when the key is absent. Marks the key as known. */
  get(key: string): ValueReader | undefined;
  /** Like `get`, but records "missing key" when absent. */
  need(key: string, hint?: string): ValueReader | undefined;
  /** Optional number with a default. */
  numberOr(key: string, quantity: Quantity, fallback: number, limits?: NumberLimits): number;
  /** Optional choice among fixed words with a default. */
  choiceOr<T extends string>(key: string, choices: readonly T[], fallback: T): T;
  /** Declare further keys as known without reading them (for keys read elsewhere). */
  allow(...keys: string[]): void;
  /** Report unknown keys among those not read or allowed. Call once, after all reads. */
  finish(): void;
}

/** What the circuit reader offers part and wave kinds beyond the value itself. */
export interface ReadContext {
  /** Text of a file named in the circuit, resolved relative to the circuit file by the host. */
  readFile?: (relativePath: string) => string;
}
