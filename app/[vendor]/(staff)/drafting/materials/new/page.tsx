import { MaterialForm } from "@/components/catalogue/catalogue-forms";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

import { saveMaterialAction } from "../../actions";

export const metadata = { title: "New material" };

export default async function NewPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  await requirePageAccess(slug, "catalogue.edit", `/${slug}/drafting/materials/new`);
  return (
    <>
      <PageHeader title="New material" />
      <MaterialForm vendorSlug={slug} action={saveMaterialAction} />
    </>
  );
}
