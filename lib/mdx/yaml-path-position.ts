import { isMap, isScalar, isSeq, type Document, type Node } from "yaml";

type Range = [number, number, number] | undefined | null;

function keyOf(key: unknown): unknown {
  return isScalar(key) ? key.value : key;
}

/**
 * Offset in the YAML text of the node at `path`, or of the nearest ancestor that exists.
 * A path ending at a map key points at the key (`vf:`), so a missing or block value still
 * reports the line a reader looks for. `unknownKey` points at an unexpected key of that map.
 */
export function yamlPathOffset(doc: Document, path: readonly PropertyKey[], unknownKey?: string): number {
  let node: unknown = doc.contents;
  let offset = (doc.contents as Node | null)?.range?.[0] ?? 0;
  const steps = unknownKey === undefined ? path : [...path, unknownKey];
  for (const step of steps) {
    if (isMap(node)) {
      const pair = node.items.find((item) => String(keyOf(item.key)) === String(step));
      if (!pair) break;
      const range: Range = (pair.key as Node | null)?.range;
      if (range) offset = range[0];
      node = pair.value;
    } else if (isSeq(node) && typeof step === "number") {
      const item = node.items[step] as Node | undefined;
      if (!item) break;
      if (item.range) offset = item.range[0];
      node = item;
    } else {
      break;
    }
  }
  return offset;
}
