import { CutterForm } from "@/components/catalogue/catalogue-forms";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

import { saveCutterAction } from "../../actions";

export const metadata = { title: "New cutter" };

export default async function NewCutterPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  await requirePageAccess(slug, "catalogue.edit", `/${slug}/drafting/cutters/new`);
  return (
    <>
      <PageHeader title="New cutter" lead="Sizes in millimetres." />
      <CutterForm vendorSlug={slug} action={saveCutterAction} />
    </>
  );
}
