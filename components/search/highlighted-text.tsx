import type { HighlightRange } from "@/search/run/highlight";

/** Text with the matched ranges in <mark>; React escapes every piece, so no markup comes from the data. */
export function HighlightedText({ text, ranges }: { text: string; ranges: readonly HighlightRange[] }) {
  const parts: { text: string; mark: boolean }[] = [];
  let at = 0;
  for (const [start, end] of ranges) {
    if (start < at || end > text.length) continue;
    if (start > at) parts.push({ text: text.slice(at, start), mark: false });
    parts.push({ text: text.slice(start, end), mark: true });
    at = end;
  }
  if (at < text.length) parts.push({ text: text.slice(at), mark: false });
  return (
    <>
      {parts.map((p, i) =>
        p.mark ? (
          <mark key={i} className="rounded-sm bg-amber-100 px-0.5 text-inherit">
            {p.text}
          </mark>
        ) : (
          <span key={i}>{p.text}</span>
        ),
      )}
    </>
  );
}
