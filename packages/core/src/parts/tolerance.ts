import type { NumberLimits } from '../reading/reader.ts';
import type { Quantity } from '../units/quantity.ts';

/** How draws spread between a tolerance's limits. */
export type Distribution = 'uniform' | 'normal';
export const distributions: readonly Distribution[] = ['uniform', 'normal'];

/** How far one value of a part may stray from its nominal, as written under `tolerance:`. */
export interface Tolerance {
  /** Key of the varied value: one of the part kind's `tolerable` keys. */
  readonly key: string;
  /** `relative`: `amount` is a fraction of the nominal (`1%` is 0.01); `absolute`: in the value's unit. */
  readonly mode: 'relative' | 'absolute';
  readonly amount: number;
  /**
   * `uniform`: equally likely anywhere within the limits. `normal`: the limits are 3 sigma, and
   * draws beyond them are drawn again (a part outside its tolerance would be rejected).
   */
  readonly distribution: Distribution;
}

/**
 * A value of a part kind that `tolerance:` may vary. A kind lists these in `PartKind.tolerable`;
 * the first one is the value a plain `tolerance: 1%` applies to, when its key is the kind's key.
 */
export interface TolerableValue<Spec> {
  /** The key under `tolerance:` (`gbw`), or the kind's own key for its main value. */
  readonly key: string;
  readonly quantity: Quantity;
  /** What every varied value must still satisfy (as when the nominal is read). */
  readonly limits?: NumberLimits;
  /** The nominal numbers under this key: one, or two for a `[low, high]` pair. */
  values(spec: Spec): readonly number[];
  /** A copy of `spec` with every number under this key replaced by `change(number)`. */
  vary(spec: Spec, change: (nominal: number) => number): Spec;
}

/**
 * The value of `nominal` at `deviation` in [-1, 1], where ±1 are the tolerance's limits.
 * Relative tolerances scale, absolute ones add.
 */
export function deviated(tolerance: Tolerance, nominal: number, deviation: number): number {
  return tolerance.mode === 'relative' ? nominal * (1 + deviation * tolerance.amount) : nominal + deviation * tolerance.amount;
}

/** A tolerable number stored in one field of a spec. */
export function tolerableField<Spec, F extends keyof Spec & string>(key: string, field: F, quantity: Quantity, limits?: NumberLimits): TolerableValue<Spec> {
  return {
    key,
    quantity,
    ...(limits ? { limits } : {}),
    values: (spec) => [spec[field] as number],
    vary: (spec, change) => ({ ...spec, [field]: change(spec[field] as number) }),
  };
}
