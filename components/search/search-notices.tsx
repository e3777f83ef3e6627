"use client";

import Link from "next/link";

import type { SearchResponse } from "@/search/run/search-response";

const KIND_WORDS: Record<string, string> = {
  flutes: "flute count",
  geometry: "cutter type",
  cornerForm: "corner form",
  operation: "operation",
  diameter: "diameter",
  materialGroup: "material group",
  material: "exact material",
};

/** Count, corrections, relaxed parts and matching cutters: the lines above the results. */
export function SearchNotices({
  data,
  busy,
  failed,
  vendorSlug,
}: {
  data?: SearchResponse;
  busy: boolean;
  failed: boolean;
  vendorSlug: string;
}) {
  return (
    <div className="space-y-1 text-sm text-stone-600">
      <p role="status" aria-live="polite">
        {failed ? (
          "Search is not answering right now; try again in a moment."
        ) : data ? (
          <>
            <span className="num" data-testid="search-total">
              {data.total}
            </span>{" "}
            {data.total === 1 ? "sheet" : "sheets"}
            {busy ? <span className="ml-2 text-stone-600">· updating…</span> : null}
          </>
        ) : (
          "Searching…"
        )}
      </p>
      {data?.corrections.length ? <p>Read {data.corrections.map((c) => `“${c.from}” as “${c.to}”`).join(", ")}.</p> : null}
      {data?.relaxed.length ? (
        <p>No sheet matches every part; these match without the {data.relaxed.map((k) => KIND_WORDS[k] ?? k).join(", ")}.</p>
      ) : null}
      {data?.cutters.length ? (
        <p>
          Cutters:{" "}
          {data.cutters.map((c, i) => (
            <span key={c.sku}>
              {i > 0 ? ", " : null}
              <Link className="font-mono underline" href={`/${vendorSlug}/library/cutters/${encodeURIComponent(c.sku)}`}>
                {c.sku}
              </Link>{" "}
              {c.name}
            </span>
          ))}
        </p>
      ) : null}
    </div>
  );
}
