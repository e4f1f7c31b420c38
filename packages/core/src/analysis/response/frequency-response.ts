import type { Circuit, ResponseSettings } from '../../circuit/circuit.ts';
import { defaultPerDecade } from '../../circuit/read-response.ts';
import { frequencySweep } from '../../small-signal/frequency-sweep.ts';
import { stageShape } from '../report/stage-shape.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import { marginHint } from './margin-hint.ts';
import { loopWarning } from './loop-warnings.ts';
import type { FrequencyResponse, LoopFinding, ResponseOptions, ResponseWarning } from './types.ts';

/** Phase margin the hints aim for when the options do not say: little overshoot, common practice. */
const DEFAULT_TARGET_MARGIN = 60;

/**
 * The frequency response of `circuit` linearized at its t = 0 operating point, with each
 * amplifier's loop gain, crossover and margins; a hint for each differentiator whose margin
 * falls short of `targetMargin`, and a warning for each loop without figures (an amplifier at
 * a rail at the operating point, a crossover outside the sweep). Sweep settings come from the
 * circuit's `response:` section, each overridable in `options`.
 */
export function frequencyResponse(circuit: Circuit, options: ResponseOptions = {}): FrequencyResponse {
  const settings = sweepSettings(circuit, options);
  const targetMargin = options.targetMargin ?? DEFAULT_TARGET_MARGIN;
  const sweep = frequencySweep(circuit, settings);
  const warnings: ResponseWarning[] = [];
  const loops: LoopFinding[] = sweep.loops.map((loop) => {
    const warning = loopWarning(loop, sweep.operatingPoint, settings);
    if (warning !== undefined) warnings.push(warning);
    const amp = circuit.parts.find((p): p is OpampSpec => p.name === loop.part && p.kind === 'opamp');
    const hint = amp !== undefined ? marginHint(circuit, loop, amp, stageShape(circuit, amp), settings, targetMargin) : undefined;
    return hint !== undefined ? { ...loop, hint } : loop;
  });
  return { ...sweep, loops, targetMargin, warnings };
}

function sweepSettings(circuit: Circuit, options: ResponseOptions): ResponseSettings {
  const section = circuit.response;
  const settings = {
    input: options.input ?? section?.input,
    from: options.from ?? section?.from,
    to: options.to ?? section?.to,
    perDecade: options.perDecade ?? section?.perDecade ?? defaultPerDecade,
  };
  const missing = (['input', 'from', 'to'] as const).filter((key) => settings[key] === undefined);
  if (missing.length > 0) {
    throw new Error(`frequency response of ${circuit.name}: no ${missing.join(', ')}: give them in the options or in the circuit's response: section`);
  }
  if (!(settings.from! > 0 && settings.to! > settings.from! && Number.isInteger(settings.perDecade) && settings.perDecade >= 1)) {
    throw new Error(`frequency response of ${circuit.name}: the sweep needs 0 < from < to and a whole number of points per decade (got from ${settings.from}, to ${settings.to}, per decade ${settings.perDecade})`);
  }
  return settings as ResponseSettings;
}
