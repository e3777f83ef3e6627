import type { Batch } from "@/lib/families/get-batch";

export const batchStateLabels: Record<Batch["state"], string> = {
  generating: "Generating",
  in_review: "In review",
  approved: "Approved",
  published: "Published",
  failed: "Failed",
};

/** A family's batches, newest first. */
export function BatchList({ batches, base }: { batches: Batch[]; base: string }) {
  if (!batches.length) return <p className="text-sm text-stone-600">No batch generated yet.</p>;
  return (
    <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white">
      {batches.map((b) => (
        <li key={b.id} className="flex flex-wrap items-center gap-3 px-4 py-2 text-sm">
          <a className="font-medium underline" href={`${base}/batches/${b.number}`}>
            Batch {b.number}
          </a>
          <span>{batchStateLabels[b.state]}</span>
          <span>
            rules version <span className="num">{b.ruleVersion}</span>
          </span>
          <span className="num">{b.total} cells</span>
          <span className="text-stone-600">by {b.createdByName ?? "a former member"}</span>
        </li>
      ))}
    </ul>
  );
}
