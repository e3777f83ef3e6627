import type { EntryCapabilityKey } from "@/content-schema/setup-fields";
import { formatQuantity, WARNING_CODES, type AdaptResult, type UnitSystem } from "@/lib/machining";

// Warnings about the entry move: the plunge held down by Z thrust, a ramp or helix recommended or required,
// the depth per pass of a straight plunge. Keyed on the rule, so a new entry warning shows here too.
const ENTRY_RULES = new Set(["plunge-feed", "entry-capability"]);
const isEntryWarning = (code: string) =>
  ENTRY_RULES.has((WARNING_CODES as Record<string, { rule: string }>)[code]?.rule ?? "") || /ramp|helix|plunge|entry/.test(code);

/** The entry move in one box: the plunge feed for this machine and what to do about it. */
export function EntryAdvice({
  result,
  entryCapability,
  units,
}: {
  result: AdaptResult;
  entryCapability: EntryCapabilityKey;
  units: UnitSystem;
}) {
  const warnings = result.warnings.filter((w) => isEntryWarning(w.code));
  if (result.plungeFeedMmMin === null && !warnings.length) return null;
  const required = warnings.some((w) => /required|refused/.test(w.code));
  return (
    <section
      aria-labelledby="adapt-entry"
      data-entry-advice
      className={`rounded border p-3 text-sm ${warnings.length ? "border-amber-400 bg-amber-50" : "border-stone-300 bg-white"}`}
    >
      <h3 id="adapt-entry" className="font-semibold">
        {warnings.length ? <span aria-hidden>⚠ </span> : null}
        Entry move
        {required
          ? ": ramp or helix required on this machine"
          : warnings.some((w) => /ramp|helix/.test(w.code))
            ? ": ramp or helix recommended"
            : ""}
      </h3>
      {result.plungeFeedMmMin !== null ? (
        <p className="mt-1">
          Straight plunge at{" "}
          <span className="num font-medium" data-testid="entry-plunge-feed">
            {formatQuantity(result.plungeFeedMmMin, "feedRate", units)}
          </span>
          {entryCapability === "plunge-only" ? ", the only entry your CAM makes." : "."}
        </p>
      ) : null}
      {warnings.length ? (
        <ul className="mt-2 space-y-1" aria-label="Entry warnings">
          {warnings.map((w) => (
            <li key={w.code} data-entry-warning={w.code}>
              <span className="font-medium">{WARNING_CODES[w.code]?.title ?? w.code}.</span> {w.message}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
