import type { PartSpecBase, PinRef } from '../parts/part-kind.ts';
import type { IssueSink } from '../reading/yaml-reader.ts';
import type { ValueReader } from '../reading/reader.ts';
import { closest } from '../reading/suggest.ts';

/** The ground node's name. */
export const ground = 'gnd';

/** Every node name except ground, in order of first appearance. */
export function nodesInOrder(parts: readonly PartSpecBase[]): string[] {
  const seen = new Set<string>();
  for (const part of parts) for (const pin of part.pins) if (pin.node !== '' && pin.node !== ground) seen.add(pin.node);
  return [...seen];
}

/**
 * Checks across parts: the circuit reaches ground, and no node hangs from a single pin
 * unless it is recorded on purpose. A lone node whose name is close to another node's is
 * almost always a misspelling, so that is an error; other lone nodes get a warning.
 */
export function checkConnections(parts: readonly PartSpecBase[], recorded: readonly string[], partsValue: ValueReader | undefined, sink: IssueSink): void {
  const pinsByNode = new Map<string, { part: string; pin: PinRef }[]>();
  for (const part of parts) {
    for (const pin of part.pins) {
      if (pin.node === '') continue;
      const list = pinsByNode.get(pin.node) ?? [];
      list.push({ part: part.name, pin });
      pinsByNode.set(pin.node, list);
    }
  }
  if (parts.length > 0 && !pinsByNode.has(ground)) {
    const lookalike = [...pinsByNode.keys()].find((node) => node.toLowerCase() === ground);
    sink.add({
      severity: 'error',
      message: `no part connects to ground (${ground})`,
      hint: lookalike !== undefined
        ? `ground is written '${ground}' in lowercase; found '${lookalike}'`
        : `connect the reference end of a source to ${ground}, e.g. between: [in, ${ground}]`,
      path: ['parts'],
      position: partsValue?.position,
    });
  }
  const names = [...pinsByNode.keys()];
  const isLone = (node: string) => pinsByNode.get(node)!.length === 1 && node !== ground && !recorded.includes(node);
  for (const [node, pins] of pinsByNode) {
    if (!isLone(node)) continue;
    const { part, pin } = pins[0];
    const near = closest(node, names.filter((other) => other !== node));
    // Two lone nodes with near names are one node spelt two ways: report it once, at the later one.
    if (near !== undefined && isLone(near) && names.indexOf(near) > names.indexOf(node)) continue;
    sink.add({
      severity: near !== undefined ? 'error' : 'warning',
      message: `node '${node}' is only connected to ${part}`,
      hint: near !== undefined
        ? `did you mean '${near}'?`
        : `nothing else connects to it: check the spelling, or add it to record: if it is a test point (record: [..., ${node}])`,
      path: pin.path,
      part,
      position: pin.position,
    });
  }
}
