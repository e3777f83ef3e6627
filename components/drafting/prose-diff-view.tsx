import type { ProsePart } from "@/lib/sheets/prose-diff";

/** Word-level text diff: insertions underlined in green, deletions struck in red, each with a sign for screen readers. */
export function ProseDiffView({ parts }: { parts: ProsePart[] }) {
  return (
    <pre className="overflow-x-auto whitespace-pre-wrap rounded-md border border-stone-300 bg-white p-4 font-mono text-xs leading-relaxed">
      {parts.map((part, i) =>
        part.added ? (
          <ins key={i} className="bg-green-100 text-green-900 underline">
            <span className="sr-only">[added: </span>
            {part.value}
            <span className="sr-only">]</span>
          </ins>
        ) : part.removed ? (
          <del key={i} className="bg-red-100 text-red-900">
            <span className="sr-only">[removed: </span>
            {part.value}
            <span className="sr-only">]</span>
          </del>
        ) : (
          <span key={i}>{part.value}</span>
        ),
      )}
    </pre>
  );
}
