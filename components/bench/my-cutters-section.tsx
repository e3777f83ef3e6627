import Link from "next/link";

import { ActionForm } from "@/components/drafting/action-form";
import { EmptyState } from "@/components/ui/empty-state";
import type { FormAction } from "@/lib/actions/action-state";
import { formatLength, type UnitSystem } from "@/lib/machining";
import type { CutterShopSheets } from "@/lib/my-cutters/list-shop-sheets";

import { AddCutterForm } from "./add-cutter-form";

type Props = {
  vendorSlug: string;
  rows: CutterShopSheets[];
  hasMachines: boolean;
  units: UnitSystem;
  addMyCutterAction: FormAction;
  removeMyCutterAction: FormAction;
};

/** My cutters, and for each the sheets that fit each of my machines. */
export function MyCuttersSection({ vendorSlug, rows, hasMachines, units, addMyCutterAction, removeMyCutterAction }: Props) {
  return (
    <section aria-labelledby="my-cutters" className="mb-8">
      <h2 id="my-cutters" className="mb-3 text-lg font-semibold">
        My cutters
      </h2>
      <div className="mb-4 max-w-md">
        <AddCutterForm vendorSlug={vendorSlug} addMyCutterAction={addMyCutterAction} />
      </div>
      {rows.length === 0 ? (
        <EmptyState title="No cutters yet.">
          Add the cutters in your shop to see which sheets fit your machines, and to filter the Library to your shop.
        </EmptyState>
      ) : (
        <ul className="space-y-4">
          {rows.map(({ cutter, machines }) => (
            <li key={cutter.id} data-my-cutter={cutter.sku} className="rounded-md border border-stone-300 bg-white p-4">
              <div className="mb-2 flex flex-wrap items-center justify-between gap-3">
                <p>
                  <Link href={`/${vendorSlug}/library/cutters/${encodeURIComponent(cutter.sku)}`} className="num font-semibold underline">
                    {cutter.sku}
                  </Link>{" "}
                  · {cutter.name} · <span className="num">D {formatLength(cutter.diameterMm, units)}</span>
                </p>
                <ActionForm
                  action={removeMyCutterAction}
                  hidden={{ vendor: vendorSlug, cutterId: cutter.id }}
                  submitLabel="Remove"
                  variant="quiet"
                  label={`Remove ${cutter.sku} from my cutters`}
                />
              </div>
              {!hasMachines ? (
                <p className="text-sm text-stone-600">Register a machine to see which of this cutter&apos;s sheets fit it.</p>
              ) : null}
              {machines.map(({ machine, sheets }) => (
                <div key={machine.id} className="mt-2">
                  <h3 className="text-sm font-semibold">On {machine.name}</h3>
                  {sheets.length ? (
                    <ul className="ml-4 list-disc text-sm">
                      {sheets.map((s) => (
                        <li key={s.slug}>
                          <Link href={`/${vendorSlug}/library/${s.slug}/v/${s.number}`} className="underline">
                            {s.materialName} · {s.machineClassName}
                          </Link>{" "}
                          (version {s.number}) ·{" "}
                          <Link href={`/${vendorSlug}/bench/adapt/${s.versionId}`} className="underline">
                            Adapt
                          </Link>
                        </li>
                      ))}
                    </ul>
                  ) : (
                    <p className="ml-4 text-sm text-stone-600">No published sheet of this cutter fits this machine yet.</p>
                  )}
                </div>
              ))}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
