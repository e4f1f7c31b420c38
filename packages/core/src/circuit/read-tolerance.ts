import type { MapReader, ValueReader } from '../reading/reader.ts';
import type { PartKind, PartSpecBase } from '../parts/part-kind.ts';
import { deviated, distributions, type Distribution, type TolerableValue, type Tolerance } from '../parts/tolerance.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';

/**
 * Read a part's `tolerance:` and `distribution:` keys. `tolerance: 1%` (relative) or
 * `tolerance: 50` (absolute, in the value's unit) varies the kind's main value;
 * `tolerance: { gbw: 33%, offset: 2mV }` names the values. Every varied value must stay
 * valid at both limits. Returns undefined when the part has no tolerance.
 */
export function readTolerances(kind: PartKind<PartSpecBase>, spec: PartSpecBase, options: MapReader): readonly Tolerance[] | undefined {
  const value = options.get('tolerance');
  const distributionValue = options.get('distribution');
  if (value === undefined) {
    distributionValue?.fail('`distribution` has no `tolerance` to apply to', 'add `tolerance: 1%` or remove `distribution`');
    return undefined;
  }
  const tolerable = kind.tolerable ?? [];
  const keys = tolerable.map((t) => t.key);
  if (tolerable.length === 0) {
    value.fail(`a ${kind.key} has no value that may vary`, 'remove `tolerance`');
    return undefined;
  }
  const distribution = options.choiceOr<Distribution>('distribution', distributions, 'uniform');
  if (value.kind() !== 'map') {
    const main = tolerable[0];
    if (main.key !== kind.key) {
      value.fail(`an ${kind.key}'s tolerance names the values it varies`, `write for example \`tolerance: { ${keys.slice(0, 2).map((k) => `${k}: 10%`).join(', ')} }\`; the keys are ${keys.join(', ')}`);
      return undefined;
    }
    const tolerance = readOne(value, main, spec, distribution);
    return tolerance === undefined ? [] : [tolerance];
  }
  const map = value.map();
  const tolerances: Tolerance[] = [];
  for (const t of tolerable) {
    const item = map.get(t.key);
    const tolerance = item === undefined ? undefined : readOne(item, t, spec, distribution);
    if (tolerance !== undefined) tolerances.push(tolerance);
  }
  if (map.keys().length === 0) value.fail('the tolerance map is empty', `name values to vary: ${keys.join(', ')}`);
  map.finish();
  return tolerances;
}

function readOne(value: ValueReader, tolerable: TolerableValue<PartSpecBase>, spec: PartSpecBase, distribution: Distribution): Tolerance | undefined {
  // ±1 dB is a ratio, not a gain difference: refuse it rather than read 1 dB as ±1.12 V/V.
  if (tolerable.quantity.decibels && value.kind() === 'scalar' && /dB\s*$/.test(value.text())) {
    value.fail('a gain tolerance cannot be written in dB', 'write it in percent (±1 dB is about +12% / -11%) or as a gain difference in V/V');
    return undefined;
  }
  const relative = value.kind() === 'scalar' && value.text().trim().endsWith('%');
  const amount = relative ? value.number(quantities.fraction, { min: 0 }) : value.number(tolerable.quantity, { min: 0 });
  if (Number.isNaN(amount)) return undefined;
  const tolerance: Tolerance = { key: tolerable.key, mode: relative ? 'relative' : 'absolute', amount, distribution };
  const unit = tolerable.quantity.units[0] ?? '';
  for (const nominal of tolerable.values(spec)) {
    if (Number.isNaN(nominal)) continue; // the nominal's own error is reported already
    for (const side of [-1, 1]) {
      const reached = deviated(tolerance, nominal, side);
      const problem = breaks(reached, tolerable);
      if (problem !== undefined) {
        value.fail(`this tolerance lets the ${tolerable.quantity.name} reach ${formatSI(reached, unit)}, but it ${problem}`, relative ? 'use a smaller percentage' : `use a tolerance below ${formatSI(Math.abs(nominal), unit)}, or write it in percent`);
        return undefined;
      }
    }
  }
  return tolerance;
}

/** What a varied value breaks of its limits, in words; undefined when it is fine. */
function breaks(x: number, tolerable: TolerableValue<PartSpecBase>): string | undefined {
  const limits = tolerable.limits;
  if (limits === undefined) return undefined;
  if (limits.above !== undefined && !(x > limits.above)) return `must be above ${limits.above}`;
  if (limits.min !== undefined && x < limits.min) return `must be at least ${limits.min}`;
  if (limits.max !== undefined && x > limits.max) return `must be at most ${limits.max}`;
  return undefined;
}
