import type { Device } from '../parts/device.ts';

/** What an observer may look up once, before the run. */
export interface ObserverContext {
  /** Unknown index of a node by name (-1 for gnd); throws for an unknown name. */
  node(name: string): number;
  readonly devices: readonly Device[];
  /** Label of every unknown, for messages. */
  readonly labels: readonly string[];
}

/**
 * Something that watches the run from inside the step loop: an ADC sampling at its instants,
 * a saturation tracker. Observers never change the solution; instants they ask for become
 * landing points (the stepper ends a step on them exactly, without damping: they are not
 * discontinuities).
 */
export interface StepObserver {
  bind(context: ObserverContext): void;
  /** First instant strictly after `t` at which the observer needs the exact solution. */
  nextInstant?(t: number): number;
  /** Called with every accepted solution (the operating point first, at t = 0). */
  accepted(t: number, x: Float64Array): void;
}
