import { notFound } from "next/navigation";

import { MaterialForm } from "@/components/catalogue/catalogue-forms";
import { CatalogueItemView } from "@/components/catalogue/catalogue-item-view";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { findDraftingMaterial } from "@/lib/catalogue/page-data";

import { saveMaterialAction } from "../../actions";
import { DetailCard } from "./detail-card";

type Props = { params: Promise<{ vendor: string; slug: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, slug } = await params;
  return { title: (await findDraftingMaterial(vendor, slug))?.name ?? "Not found" };
}

export default async function DetailPage({ params }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  const { member } = await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/materials/${slug}`);
  const item = await findDraftingMaterial(vendorSlug, slug);
  if (!item) notFound();
  const { id, updatedAt: _updatedAt, ...fields } = item;
  const editForm = can(member?.role, "catalogue.edit") ? (
    <MaterialForm
      vendorSlug={vendorSlug}
      action={saveMaterialAction}
      id={id}
      defaultValues={{
        ...fields,
        synonyms: fields.synonyms.join(", "),
        cautions: fields.cautions.map((c) => `${c.kind}: ${c.text}`).join("\n"),
      }}
    />
  ) : null;
  return <CatalogueItemView title={item.name} detail={<DetailCard item={item} />} editForm={editForm} />;
}
