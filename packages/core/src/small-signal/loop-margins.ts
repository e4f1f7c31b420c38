import { nearestTurn } from './complex-figures.ts';
import { crossingBetween } from './refine.ts';

/** The stability figures of one loop (see `LoopResponse`). */
export interface LoopMargins {
  readonly crossover: number | null;
  readonly phaseMargin: number | null;
  readonly phaseCrossover: number | null;
  readonly gainMargin: number | null;
}

/** The return ratio at any frequency: |T| in dB and its phase in (-180°, 180°]. */
export interface LoopProbe {
  dB(f: number): number;
  principalDegrees(f: number): number;
}

/**
 * Margins of a loop from its return ratio on the sweep (`dB`, unwrapped `degrees`), each
 * crossing refined on `probe` between the two sweep points around it:
 * - crossover: the highest frequency where |T| falls through 1 (0 dB); beyond it the loop
 *   gain stays below 1 within the sweep. Phase margin = 180° + ∠T there.
 * - phase crossover: the lowest frequency where ∠T falls through -180°; gain margin =
 *   -|T| in dB there.
 * The phase between two sweep points is taken in the turn nearest to theirs.
 */
export function loopMargins(frequency: Float64Array, dB: Float64Array, degrees: Float64Array, probe: LoopProbe): LoopMargins {
  const n = frequency.length;
  let last = -1;
  for (let i = 0; i < n; i++) if (dB[i] >= 0) last = i;
  const phaseNear = (f: number, i: number): number => nearestTurn(probe.principalDegrees(f), (degrees[i] + degrees[i + 1]) / 2);

  let crossover: number | null = null;
  let phaseMargin: number | null = null;
  if (last >= 0 && last < n - 1) {
    const f = crossingBetween(frequency[last], frequency[last + 1], 0, (g) => probe.dB(g));
    crossover = f;
    phaseMargin = 180 + phaseNear(f, last);
  }

  let phaseCrossover: number | null = null;
  let gainMargin: number | null = null;
  for (let i = 0; i + 1 < n; i++) {
    if (degrees[i] >= -180 && degrees[i + 1] < -180) {
      const f = crossingBetween(frequency[i], frequency[i + 1], -180, (g) => phaseNear(g, i));
      phaseCrossover = f;
      gainMargin = -probe.dB(f);
      break;
    }
  }
  return { crossover, phaseMargin, phaseCrossover, gainMargin };
}
