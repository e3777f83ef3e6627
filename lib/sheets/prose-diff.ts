import { diffLines, diffWords } from "diff";

export type ProsePart = { value: string; added: boolean; removed: boolean };

/** Line diff of two texts, with changed lines refined to word level (pure). */
export function diffProse(before: string, after: string): { lines: ProsePart[]; words: ProsePart[] } {
  const plain = (parts: { value: string; added?: boolean; removed?: boolean }[]) =>
    parts.map((p) => ({ value: p.value, added: Boolean(p.added), removed: Boolean(p.removed) }));
  return { lines: plain(diffLines(before, after)), words: plain(diffWords(before, after)) };
}
