import { notFound } from "next/navigation";

import { MachineClassForm } from "@/components/catalogue/catalogue-forms";
import { loadMachineClass } from "@/components/catalogue/load-drafting-item";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";

import { saveMachineClassAction } from "../../actions";
import { DetailCard } from "./detail-card";

type Props = { params: Promise<{ vendor: string; slug: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, slug } = await params;
  return { title: (await loadMachineClass(vendor, slug))?.name ?? "Not found" };
}

export default async function DetailPage({ params }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  const { member } = await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/machine-classes/${slug}`);
  const item = await loadMachineClass(vendorSlug, slug);
  if (!item) notFound();
  const { id, updatedAt: _updatedAt, ...fields } = item;
  return (
    <>
      <PageHeader title={item.name} />
      <DetailCard item={item} />
      {can(member?.role, "catalogue.edit") ? (
        <section aria-labelledby="edit-heading" className="mt-8">
          <h2 id="edit-heading" className="mb-3 text-lg font-semibold">Edit</h2>
          <MachineClassForm vendorSlug={vendorSlug} action={saveMachineClassAction} id={id} defaultValues={{ ...fields, zThrustN: fields.zThrustN ?? "" }} />
        </section>
      ) : null}
    </>
  );
}
