import { notFound } from "next/navigation";

import { deleteMachineAction } from "@/app/[vendor]/(customer)/bench/actions";
import { DeleteMachineForm } from "@/components/bench/delete-machine-form";
import { MachineForm } from "@/components/bench/machine-form";
import { machineToValues } from "@/components/bench/machine-values";
import { PageHeader } from "@/components/ui/page-header";
import { findBenchMachine } from "@/lib/bench/page-data";

import { saveMachineAction } from "../../actions";

export const metadata = { title: "Edit machine" };

export default async function EditMachinePage({ params }: { params: Promise<{ vendor: string; id: string }> }) {
  const { vendor: slug, id } = await params;
  const found = await findBenchMachine(slug, id);
  if (!found) notFound();
  const { vendor, machine } = found;
  return (
    <>
      <PageHeader title={`Edit ${machine.name}`} lead="Setups already saved keep the numbers they were computed with." />
      <MachineForm vendorSlug={vendor.slug} id={machine.id} initial={machineToValues(machine)} action={saveMachineAction} />
      <DeleteMachineForm deleteMachineAction={deleteMachineAction} vendorSlug={vendor.slug} id={machine.id} name={machine.name} />
    </>
  );
}
