import { MachineForm } from "@/components/bench/machine-form";
import { EMPTY_MACHINE_VALUES } from "@/components/bench/machine-values";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

import { saveMachineAction } from "../../actions";

export const metadata = { title: "Register a machine" };

export default async function NewMachinePage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "bench.use", `/${slug}/bench/machines/new`);
  return (
    <>
      <PageHeader
        title="Register a machine"
        lead="Its limits decide how every sheet is adapted: spindle range, power, feed, stiffness and how far the tool sticks out."
      />
      <MachineForm vendorSlug={vendor.slug} initial={EMPTY_MACHINE_VALUES} action={saveMachineAction} />
    </>
  );
}
