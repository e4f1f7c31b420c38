import type { Device } from '../parts/device.ts';
import type { Topology } from './topology.ts';

/** Why the equations have no unique solution, in the user's terms. */
export interface SingularCause {
  readonly message: string;
  readonly nodes: readonly string[];
  readonly parts: readonly string[];
  readonly hint: string;
}

/**
 * Explain a singular matrix by its usual causes, checked on the circuit's graph: a loop of
 * voltage-defined branches (sources, inductors at DC, held capacitors), then nodes that float
 * (nothing that conducts at DC joins them to ground). `unknown` is the column the
 * factorization stopped at, the fallback culprit. During a time step (`stepping`) a graph
 * that passes both checks was solvable at the operating point: what is left is arithmetic,
 * values around that unknown too many decades apart for double precision.
 */
export function diagnoseSingular(devices: readonly Device[], topology: Topology, unknown: number, stepping: boolean): SingularCause {
  const found = findVoltageLoop(devices, topology) ?? findFloatingNodes(devices, topology);
  if (found !== undefined) return found;
  const label = topology.labels[unknown] ?? 'an unknown';
  const nodes = unknown >= 0 && unknown < topology.size ? [label] : [];
  if (!stepping) {
    return { message: `the circuit equations have no unique solution at ${label}`, nodes, parts: [], hint: 'check that a resistor, source or inductor joins every node to gnd, and that no two sources fix the same voltage' };
  }
  const parts = devices.filter((d) => d.links().some((link) => link.a === unknown || link.b === unknown)).map((d) => d.name);
  return {
    message: `the circuit equations at ${label} are too ill-conditioned to solve: the values there (${parts.length > 0 ? listWords(parts) : 'its parts'}, and what drives them) are more decades apart than double precision holds`,
    nodes,
    parts,
    hint: 'check those values and the sources for a missing or wrong prefix (a 1G capacitor, a 1e25 V point): a value many decades from the rest of the circuit leaves this node undetermined in arithmetic',
  };
}

/** Disjoint sets over unknowns 0..n-1 plus ground at index n. */
class Groups {
  private readonly parent: Int32Array;
  constructor(private readonly n: number) {
    this.parent = Int32Array.from({ length: n + 1 }, (_, i) => i);
  }
  find(i: number): number {
    const k = i < 0 ? this.n : i;
    let r = k;
    while (this.parent[r] !== r) r = this.parent[r];
    this.parent[k] = r;
    return r;
  }
  join(a: number, b: number): void {
    this.parent[this.find(a)] = this.find(b);
  }
}

function findVoltageLoop(devices: readonly Device[], topology: Topology): SingularCause | undefined {
  const groups = new Groups(topology.size);
  const edges: { a: number; b: number; part: string }[] = [];
  for (const device of devices) {
    for (const link of device.links()) {
      if (link.kind !== 'voltage') continue;
      if (groups.find(link.a) === groups.find(link.b)) {
        const parts = [...pathBetween(edges, link.a, link.b), device.name];
        return {
          message: `${listWords(parts)} form a loop that fixes voltages twice (sources, inductors, held capacitors)`,
          nodes: [],
          parts,
          hint: 'add a small series resistance to one of them, or remove one',
        };
      }
      groups.join(link.a, link.b);
      edges.push({ a: link.a, b: link.b, part: device.name });
    }
  }
  return undefined;
}

/** Parts on a path from `from` to `to` through `edges` (breadth first). */
function pathBetween(edges: readonly { a: number; b: number; part: string }[], from: number, to: number): string[] {
  const via = new Map<number, { prev: number; part: string }>([[from, { prev: from, part: '' }]]);
  const queue = [from];
  while (queue.length > 0) {
    const at = queue.shift()!;
    if (at === to) break;
    for (const e of edges) {
      const next = e.a === at ? e.b : e.b === at ? e.a : undefined;
      if (next === undefined || via.has(next)) continue;
      via.set(next, { prev: at, part: e.part });
      queue.push(next);
    }
  }
  const parts: string[] = [];
  for (let at = to; at !== from && via.has(at); at = via.get(at)!.prev) parts.unshift(via.get(at)!.part);
  return parts;
}

function findFloatingNodes(devices: readonly Device[], topology: Topology): SingularCause | undefined {
  const groups = new Groups(topology.size);
  for (const device of devices) {
    for (const link of device.links()) if (link.kind !== 'none') groups.join(link.a, link.b);
  }
  const floating: string[] = [];
  for (let i = 0; i < topology.size; i++) {
    if (!topology.isCurrent[i] && groups.find(i) !== groups.find(-1)) floating.push(topology.labels[i]);
  }
  if (floating.length === 0) return undefined;
  const touching = devices
    .filter((d) => d.links().some((l) => l.kind === 'none' && (floating.includes(topology.labels[l.a]) || floating.includes(topology.labels[l.b]))))
    .map((d) => d.name);
  const subject = floating.length === 1 ? `node ${floating[0]} floats` : `nodes ${listWords(floating)} float`;
  const around = touching.length > 0 ? ` (only ${listWords(touching)} touch${touching.length === 1 ? 'es' : ''} ${floating.length === 1 ? 'it' : 'them'})` : '';
  return {
    message: `${subject}: nothing that conducts at DC (resistor, source, inductor) joins ${floating.length === 1 ? 'it' : 'them'} to gnd, so ${floating.length === 1 ? 'its' : 'their'} steady voltage is undefined${around}`,
    nodes: floating,
    parts: touching,
    hint: touching.length > 0
      ? `connect a resistor from it to gnd or to a driven node, or give a capacitor among ${listWords(touching)} an \`initial:\` voltage`
      : 'connect a resistor from it to gnd or to a driven node',
  };
}

function listWords(words: readonly string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
