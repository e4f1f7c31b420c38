import type { ValueReader } from '../reading/reader.ts';
import { formatSI } from '../units/format.ts';
import type { AdcSpec } from './adc-spec.ts';
import type { Circuit, NoiseBand } from './circuit.ts';

/** Band defaults: from 1 Hz (or to/1000 when lower), 20 points per decade, up to 1 MHz when no converter sets a Nyquist rate. */
export const noiseBandDefaults = { from: 1, perDecade: 20, to: 1e6 } as const;

/**
 * The noise band of a `noise:` section and `adcs`: `overrides` over the section over the
 * defaults, where the upper end defaults to the highest converter's Nyquist rate (half its
 * sample rate) and the lower end to 1 Hz, or a thousandth of the upper end for a converter
 * sampling a few times a second. May be empty when explicit values disagree.
 */
export function noiseBand(section: NoiseBand | undefined, adcs: readonly AdcSpec[], overrides: NoiseBand = {}): Required<NoiseBand> {
  const rates = adcs.flatMap((a) => ('rate' in a.times ? [a.times.rate] : []));
  const nyquist = rates.length > 0 ? Math.max(...rates) / 2 : noiseBandDefaults.to;
  const to = overrides.to ?? section?.to ?? nyquist;
  return {
    from: overrides.from ?? section?.from ?? Math.min(noiseBandDefaults.from, to / 1000),
    to,
    perDecade: overrides.perDecade ?? section?.perDecade ?? noiseBandDefaults.perDecade,
  };
}

/** `noiseBand` of a circuit; throws when the band is empty (options that disagree with the file). */
export function noiseBandOf(circuit: Circuit, overrides: NoiseBand = {}): Required<NoiseBand> {
  const band = noiseBand(circuit.noise, circuit.adcs, overrides);
  if (!(band.from > 0 && band.to > band.from && Number.isInteger(band.perDecade) && band.perDecade >= 1)) {
    throw new Error(`noise of ${circuit.name}: the band needs 0 < from < to and a whole number of points per decade (got from ${band.from}, to ${band.to}, per decade ${band.perDecade})`);
  }
  return band;
}

/** When the section's `from` lies at or above the upper end its `to` or the converters give, say so at `from`. */
export function checkNoiseBand(value: ValueReader | undefined, section: NoiseBand, adcs: readonly AdcSpec[]): void {
  const band = noiseBand(section, adcs);
  if (section.from !== undefined && section.to === undefined && !(band.to > band.from)) {
    (value?.kind() === 'map' ? value.map().get('from') : value)?.fail(
      `the noise band starts (${formatSI(band.from, 'Hz')}) at or above its end, the highest converter's Nyquist rate (${formatSI(band.to, 'Hz')})`,
      'write `to:` above `from:`, or leave `from` out',
    );
  }
}
