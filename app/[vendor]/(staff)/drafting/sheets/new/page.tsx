import { NewSheetForm } from "@/components/drafting/new-sheet-form";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listCutters, listMachineClasses, listMaterials } from "@/lib/catalogue/list-catalogue";

import { createSheetAction } from "../actions";

export const metadata = { title: "New sheet" };

export default async function NewSheetPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/sheets/new`);
  const [cutters, materials, machineClasses] = await Promise.all([
    listCutters({ vendorId: vendor.id }),
    listMaterials({ vendorId: vendor.id }),
    listMachineClasses({ vendorId: vendor.id }),
  ]);
  return (
    <>
      <PageHeader
        title="New sheet"
        lead="One cutter, one material, one machine class. The first draft starts from numbers derived by the formulas."
      />
      <NewSheetForm
        vendorSlug={vendor.slug}
        action={createSheetAction}
        cutters={cutters.map((c) => ({ id: c.id, label: `${c.sku} · ${c.name}`, key: c.sku }))}
        materials={materials.map((m) => ({ id: m.id, label: m.name, key: m.slug }))}
        machineClasses={machineClasses.map((k) => ({ id: k.id, label: k.name, key: k.slug }))}
      />
    </>
  );
}
