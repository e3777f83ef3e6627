import { FamilyForm } from "@/components/families/family-form";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listMachineClasses, listMaterials } from "@/lib/catalogue/list-catalogue";

import { createFamilyAction } from "../actions";

export const metadata = { title: "New family" };

export default async function NewFamilyPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/families/new`);
  const [materials, machineClasses] = await Promise.all([
    listMaterials({ vendorId: vendor.id }),
    listMachineClasses({ vendorId: vendor.id }),
  ]);
  return (
    <>
      <PageHeader
        title="New family"
        lead="Pick the cutters, materials and machine classes; the rules start empty, so every number comes from the material's own data until you add one."
      />
      <FamilyForm
        action={createFamilyAction}
        vendorSlug={vendor.slug}
        materials={materials.map((m) => ({ id: m.id, label: m.name }))}
        machineClasses={machineClasses.map((k) => ({ id: k.id, label: k.name }))}
      />
    </>
  );
}
