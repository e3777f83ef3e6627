import Link from "next/link";

import { AlertsToggle } from "@/components/bench/alerts-toggle";
import { MachineList } from "@/components/bench/machine-list";
import { MyCuttersSection } from "@/components/bench/my-cutters-section";
import { SetupsTable } from "@/components/bench/setups-table";
import { readUnits } from "@/components/library/read-units";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listSetups } from "@/lib/bench/list-setups";
import { listMachines } from "@/lib/bench/machines";
import { wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { listMyCutterSheets } from "@/lib/my-cutters/list-shop-sheets";

import { addMyCutterAction, removeMyCutterAction, setChangeAlertsAction } from "./actions";

export const metadata = { title: "Bench" };

export default async function BenchPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor, user } = await requirePageAccess(slug, "bench.use", `/${slug}/bench`);
  const owner = { vendorId: vendor.id, userId: user!.id };
  const [machines, setups, alerts, myCutters, units] = await Promise.all([
    listMachines(owner),
    listSetups(owner),
    wantsMail(undefined, { ...owner, kind: "change_alerts" }),
    listMyCutterSheets(owner),
    readUnits(),
  ]);
  const register = (
    <Link
      href={`/${vendor.slug}/bench/machines/new`}
      className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-medium text-accent-ink"
    >
      Register a machine
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Bench"
        lead="Your machines, the setups you saved from sheets (pinned to their version) and how the cuts went."
        actions={register}
      />
      <section aria-labelledby="machines" className="mb-8">
        <h2 id="machines" className="mb-3 text-lg font-semibold">
          My machines
        </h2>
        {machines.length ? (
          <MachineList machines={machines} vendorSlug={vendor.slug} />
        ) : (
          <EmptyState title="No machines registered yet.">
            Register your machine to adapt any sheet to its spindle, power and rigidity.
          </EmptyState>
        )}
      </section>
      <MyCuttersSection
        vendorSlug={vendor.slug}
        rows={myCutters}
        hasMachines={machines.length > 0}
        units={units}
        addMyCutterAction={addMyCutterAction}
        removeMyCutterAction={removeMyCutterAction}
      />
      <section aria-labelledby="setups" className="mb-8">
        <h2 id="setups" className="mb-3 text-lg font-semibold">
          Saved setups
        </h2>
        {setups.length ? (
          <SetupsTable setups={setups} vendorSlug={vendor.slug} />
        ) : (
          <EmptyState title="No saved setups yet.">
            Open a sheet in the{" "}
            <Link className="underline" href={`/${vendor.slug}/library`}>
              Library
            </Link>{" "}
            and adapt it to your machine.
          </EmptyState>
        )}
      </section>
      <section aria-label="E-mail" className="border-t border-stone-200 pt-4">
        <AlertsToggle setChangeAlertsAction={setChangeAlertsAction} vendorSlug={vendor.slug} enabled={alerts} />
        <p className="mt-2 text-sm">
          <Link className="underline" href={`/${vendor.slug}/mail-preferences`}>
            All mail preferences
          </Link>
        </p>
      </section>
    </>
  );
}
