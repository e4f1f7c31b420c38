import type { Binder } from '../parts/device.ts';
import type { PartSpecBase } from '../parts/part-kind.ts';
import type { SimulateSettings } from './circuit.ts';
import { createDevices } from './devices.ts';
import type { IssueSink } from '../reading/yaml-reader.ts';
import { ground } from './connections.ts';

/**
 * Every pin a part leaves open at times (an open-drain output) needs another part that conducts
 * at DC on its node (a pull-up), or its voltage is undefined whenever it is open. The parts' own devices say
 * which pins those are and what conducts at DC (`links`), so the check knows no part kind.
 */
export function checkOpenPins(parts: readonly PartSpecBase[], settings: SimulateSettings, sink: IssueSink): void {
  const binder = new NameBinder();
  const devices = createDevices(parts, settings);
  for (const device of devices) device.bind(binder);
  devices.forEach((device, i) => {
    for (const open of device.openPins?.() ?? []) {
      const pin = parts[i].pins.find((p) => p.pin === open.pin);
      if (pin === undefined || pin.node === ground) continue;
      const node = binder.node(pin.node);
      const held = devices.some((other) => other !== device && other.links().some((l) => l.kind !== 'none' && (l.a === node || l.b === node)));
      if (held) continue;
      sink.add({
        severity: 'error',
        message: `node '${pin.node}' at ${open.pin} of ${device.name} is joined to nothing else that conducts at DC: ${open.why}, so its voltage is undefined while it is off`,
        hint: open.hint,
        path: pin.path,
        part: device.name,
        position: pin.position,
      });
    }
  });
}

/** Unknown numbers by node name, as the solver would give them; enough to compare links. */
class NameBinder implements Binder {
  private readonly nodes = new Map<string, number>();
  private count = 0;
  node(name: string): number {
    if (name === ground) return -1;
    let index = this.nodes.get(name);
    if (index === undefined) this.nodes.set(name, (index = this.count++));
    return index;
  }
  branch(): number {
    return this.count++;
  }
  internal(): number {
    return this.count++;
  }
}
