import type { Device } from '../parts/device.ts';
import { isOpamp } from '../parts/opamp.ts';
import type { AmplifierState } from './types.ts';

/** Where an amplifier sits at the operating point `x`: current-limited, at a rail, slewing or linear. */
export function amplifierState(device: Device, x: Float64Array): AmplifierState {
  if (!isOpamp(device)) return 'linear';
  const status = device.status(x);
  // A limited output current opens the loop, which then drives the gain node to a rail and
  // overdrives the input: name the cause first.
  if (status.currentLimited) return 'current limit';
  if (status.rail !== 0) return status.rail > 0 ? 'high rail' : 'low rail';
  return status.slewing ? 'slewing' : 'linear';
}
