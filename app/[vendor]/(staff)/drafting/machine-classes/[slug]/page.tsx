import { notFound } from "next/navigation";

import { MachineClassForm } from "@/components/catalogue/catalogue-forms";
import { CatalogueItemView } from "@/components/catalogue/catalogue-item-view";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { findDraftingMachineClass } from "@/lib/catalogue/page-data";

import { saveMachineClassAction } from "../../actions";
import { DetailCard } from "./detail-card";

type Props = { params: Promise<{ vendor: string; slug: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, slug } = await params;
  return { title: (await findDraftingMachineClass(vendor, slug))?.name ?? "Not found" };
}

export default async function DetailPage({ params }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  const { member } = await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/machine-classes/${slug}`);
  const item = await findDraftingMachineClass(vendorSlug, slug);
  if (!item) notFound();
  const { id, updatedAt: _updatedAt, ...fields } = item;
  const editForm = can(member?.role, "catalogue.edit") ? (
    <MachineClassForm
      vendorSlug={vendorSlug}
      action={saveMachineClassAction}
      id={id}
      defaultValues={{ ...fields, zThrustN: fields.zThrustN ?? "", ratedRpm: fields.ratedRpm ?? "" }}
    />
  ) : null;
  return <CatalogueItemView title={item.name} detail={<DetailCard item={item} />} editForm={editForm} />;
}
