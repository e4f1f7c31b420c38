import { across } from '../../parts/solution.ts';
import { amplifierState } from '../../small-signal/amplifier-state.ts';
import type { LinearizedCircuit } from '../../small-signal/linearized-circuit.ts';
import { formatSI } from '../../units/format.ts';
import type { ReportWarning } from '../ringing/types.ts';

/**
 * Amplifiers whose operating point is a balance no bench circuit keeps: linear, with positive
 * feedback whose loop gain at DC is above 1 (return ratio T < −1). The simulation starts there
 * exactly and nothing disturbs it, so the run shows the balance; the part itself would run to
 * a rail. One small-signal solve per linear amplifier at the t = 0 operating point.
 */
export function unstableBalances(linear: LinearizedCircuit): ReportWarning[] {
  const x = linear.operatingPoint;
  const re = new Float64Array(linear.size);
  const im = new Float64Array(linear.size);
  const found: ReportWarning[] = [];
  for (const device of linear.devices) {
    if (device.gainStage === undefined || amplifierState(device, x) !== 'linear') continue;
    const stage = device.gainStage(x);
    linear.openLoop(0, stage, re, im);
    const returnRatio = -across(re, stage.p, stage.n);
    if (!(returnRatio < -1)) continue;
    found.push({
      kind: 'balance',
      part: device.name,
      time: 0,
      message: `${device.name} starts on an unstable balance: its feedback is positive with a loop gain of ${formatSI(-returnRatio, '')} at DC, so the smallest disturbance drives it to a rail; the run holds the balance only because nothing disturbs it. Check which input the feedback goes to, or give the circuit a start that decides the state`,
    });
  }
  return found;
}
