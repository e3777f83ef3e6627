import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

export const metadata = { title: "Bench" };

export default async function BenchPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "bench.use", `/${slug}/bench`);
  return (
    <>
      <PageHeader title="Bench" lead="Your machines, the setups you saved from sheets (pinned to their version) and how the cuts went." />
      <section aria-labelledby="machines" className="mb-8">
        <h2 id="machines" className="mb-3 text-lg font-semibold">My machines</h2>
        <EmptyState title="No machines registered yet.">Register your machine to adapt any sheet to its spindle, power and rigidity.</EmptyState>
      </section>
      <section aria-labelledby="setups">
        <h2 id="setups" className="mb-3 text-lg font-semibold">Saved setups</h2>
        <EmptyState title="No saved setups yet.">
          Open a sheet in the <Link className="underline" href={`/${vendor.slug}/library`}>Library</Link> and adapt it to your machine.
        </EmptyState>
      </section>
    </>
  );
}
