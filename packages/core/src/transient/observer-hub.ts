import type { Device } from '../parts/device.ts';
import type { Topology } from '../solver/topology.ts';
import { GROUND } from '../solver/topology.ts';
import type { StepObserver } from './observer.ts';

/** The run's step observers seen as one: bound once, told of every accepted solution. */
export class ObserverHub {
  private readonly withInstants: StepObserver[];

  constructor(
    private readonly observers: readonly StepObserver[],
    topology: Topology,
    devices: readonly Device[],
  ) {
    const named = new Set(topology.labels.slice(0, topology.nodeCount));
    const context = {
      node: (name: string): number => {
        if (name !== GROUND && !named.has(name)) throw new Error(`no node named ${name}`);
        return topology.node(name);
      },
      devices,
      labels: topology.labels,
    };
    for (const o of observers) o.bind(context);
    this.withInstants = observers.filter((o) => o.nextInstant !== undefined);
  }

  /** The first instant strictly after `t` that some observer needs. */
  nextInstant(t: number): number {
    let next = Infinity;
    for (const o of this.withInstants) next = Math.min(next, o.nextInstant!(t));
    return next;
  }

  accepted(t: number, x: Float64Array): void {
    for (const o of this.observers) o.accepted(t, x);
  }
}
