import type { Binder } from '../parts/device.ts';

/** Name of the ground node; its voltage is 0 and it has no unknown. */
export const GROUND = 'gnd';

/**
 * Numbers the unknowns of the modified nodal equations: named nodes first (in the order
 * given), then branch currents and internal nodes in the order devices reserve them.
 */
export class Topology implements Binder {
  private readonly index = new Map<string, number>();
  /** Label of every unknown, for messages: a node name, or e.g. `L1 current`. */
  readonly labels: string[] = [];
  /** True where the unknown is a current (tolerances and messages differ). */
  readonly isCurrent: boolean[] = [];

  constructor(nodeNames: readonly string[]) {
    for (const name of nodeNames) this.node(name);
  }

  /** Number of named nodes (they occupy indices 0..nodeCount-1). */
  get nodeCount(): number {
    return this.index.size;
  }

  get size(): number {
    return this.labels.length;
  }

  node(name: string): number {
    if (name === GROUND) return -1;
    const found = this.index.get(name);
    if (found !== undefined) return found;
    const i = this.push(name, false);
    this.index.set(name, i);
    return i;
  }

  branch(label: string): number {
    return this.push(label, true);
  }

  internal(label: string): number {
    return this.push(label, false);
  }

  private push(label: string, isCurrent: boolean): number {
    this.labels.push(label);
    this.isCurrent.push(isCurrent);
    return this.labels.length - 1;
  }
}
