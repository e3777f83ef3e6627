import { MachineClassForm } from "@/components/catalogue/catalogue-forms";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

import { saveMachineClassAction } from "../../actions";

export const metadata = { title: "New machine class" };

export default async function NewPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  await requirePageAccess(slug, "catalogue.edit", `/${slug}/drafting/machine-classes/new`);
  return (
    <>
      <PageHeader title="New machine class" />
      <MachineClassForm vendorSlug={slug} action={saveMachineClassAction} />
    </>
  );
}
