import Link from "next/link";

import { StepsTrail } from "@/components/adapt/steps-trail";
import { ADAPTED_FIELDS } from "@/lib/adapt/adapted-diff";
import type { Readaptation } from "@/lib/adapt/readapt-setup";
import { formatQuantity, type AdaptResult, type UnitSystem } from "@/lib/machining";

type Props = {
  old: AdaptResult;
  oldNumber: number;
  next: Readaptation;
  units: UnitSystem;
  vendorSlug: string;
  setupId: string;
  yourChanges: string[];
};

/** The setup on its pinned version beside the same machine on the current version. */
export function ReadaptCompare({ old, oldNumber, next, units, vendorSlug, setupId, yourChanges }: Props) {
  const n = next.context.versionNumber;
  return (
    <section id="readapt" aria-labelledby="readapt-heading" className="mt-8 rounded-md border border-amber-500 bg-amber-50/40 p-4">
      <h2 id="readapt-heading" className="text-lg font-semibold">
        <span aria-hidden>↑ </span>Re-adapted to the current version (v{n})
      </h2>
      <p className="mt-1 text-sm text-stone-700">
        Same machine and {yourChanges.length ? `your changes (${yourChanges.join("; ")})` : "no changes of your own"}, computed on{" "}
        <Link className="underline" href={`/${vendorSlug}/library/${next.context.sheetSlug}/v/${n}`}>
          version {n}
        </Link>
        . Nothing is saved until you{" "}
        <Link className="underline" href={`/${vendorSlug}/bench/adapt/${next.context.versionId}?setup=${setupId}`}>
          adapt version {n}
        </Link>{" "}
        and save it as a new setup.
      </p>
      {next.error || !next.result ? (
        <p role="alert" className="mt-2 text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {next.error ?? "Cannot be re-adapted."}
        </p>
      ) : (
        <>
          <div role="region" aria-label={`Saved numbers beside version ${n}`} tabIndex={0} className="mt-3 max-w-full overflow-x-auto">
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="border-b border-stone-300 text-left">
                  <th scope="col" className="py-2 pr-2 font-medium">
                    Quantity
                  </th>
                  <th scope="col" className="py-2 pr-2 text-right font-medium">
                    v{oldNumber} (saved)
                  </th>
                  <th scope="col" className="py-2 text-right font-medium">
                    v{n} (current)
                  </th>
                </tr>
              </thead>
              <tbody>
                {ADAPTED_FIELDS.map((f) => {
                  const changed = next.changes.some((c) => c.field === f.field);
                  return (
                    <tr key={f.field} className="border-b border-stone-200">
                      <th scope="row" className="py-2 pr-2 text-left font-normal">
                        {f.label}
                      </th>
                      <td className="num py-2 pr-2 text-right">{formatQuantity(old[f.field], f.kind, units)}</td>
                      <td className={`num py-2 text-right ${changed ? "font-semibold" : ""}`}>
                        {formatQuantity(next.result![f.field], f.kind, units)}
                        {changed ? <span className="ml-1 text-xs font-normal text-amber-800">changed</span> : null}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          <details className="mt-3">
            <summary className="min-h-11 cursor-pointer py-2 text-sm font-medium">Steps on version {n}</summary>
            <StepsTrail steps={next.result.steps} units={units} />
          </details>
        </>
      )}
    </section>
  );
}
