import { WARNING_CODES, type AdaptWarning } from "@/lib/machining";

const CAUTION_ONLY = new Set(["standard-cautions", "values-adapted"]);

/** Engine warnings in plain words, each with an icon and a heading so colour is never the only signal. */
export function WarningList({ warnings }: { warnings: AdaptWarning[] }) {
  const shown = [...warnings].sort((a, b) => Number(CAUTION_ONLY.has(a.code)) - Number(CAUTION_ONLY.has(b.code)));
  return (
    <ul className="mt-2 space-y-2" aria-label="Warnings">
      {shown.map((w) => (
        <li
          key={w.code}
          data-warning={w.code}
          className={`rounded border p-3 text-sm ${CAUTION_ONLY.has(w.code) ? "border-stone-300 bg-white" : "border-amber-400 bg-amber-50"}`}
        >
          <p className="font-medium">
            {CAUTION_ONLY.has(w.code) ? (
              <span
                aria-hidden
                className="mr-1 inline-flex size-4 items-center justify-center rounded-full border border-stone-500 text-[10px]"
              >
                i
              </span>
            ) : (
              <span aria-hidden>⚠ </span>
            )}
            {WARNING_CODES[w.code]?.title ?? w.code}
          </p>
          <p className="mt-1 text-stone-700">{w.message}</p>
        </li>
      ))}
    </ul>
  );
}
