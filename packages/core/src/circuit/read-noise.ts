import type { ValueReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import type { NoiseBand } from './circuit.ts';

/** Above this many points a band is probably a typo in a prefix. */
const manyPoints = 1e5;

/**
 * Read `noise: { from, to, per-decade }`, every key optional (the defaults depend on the
 * converters, so they are applied where the band is used).
 */
export function readNoiseSection(value: ValueReader | undefined): NoiseBand | undefined {
  if (value === undefined) return undefined;
  if (value.kind() !== 'map') {
    value.fail('`noise` must be a map of keys', 'for example `noise: { from: 1, to: 10k, per-decade: 20 }`');
    return undefined;
  }
  const m = value.map();
  const from = m.get('from')?.number(quantities.frequency, { above: 0 });
  const toValue = m.get('to');
  const to = toValue?.number(quantities.frequency, { above: 0 });
  const perDecadeValue = m.get('per-decade');
  const perDecade = perDecadeValue?.number(quantities.count, { min: 1, max: 10000, integer: true });
  m.finish();
  const low = from ?? (to !== undefined ? Math.min(1, to / 1000) : 1);
  if (to !== undefined && from !== undefined && !(to > from) && from > 0 && to > 0) {
    toValue?.fail(`the band ends (${formatSI(to, 'Hz')}) at or below where it starts (${formatSI(from, 'Hz')})`, 'write `to:` above `from:`');
  } else if (to !== undefined && perDecade !== undefined && Math.log10(to / low) * perDecade > manyPoints) {
    perDecadeValue?.warn(`the band makes ${Math.round(Math.log10(to / low) * perDecade)} points`, 'check the prefixes of `from` and `to`: m is milli, M is mega');
  }
  return { ...(from !== undefined ? { from } : {}), ...(to !== undefined ? { to } : {}), ...(perDecade !== undefined ? { perDecade } : {}) };
}
