import { MachineClassForm } from "@/components/catalogue/catalogue-forms";
import { PageHeader } from "@/components/ui/page-header";
import { machineClassPrefillSchema, prefillDefaults } from "@/content-schema/machine-class-prefill";
import { requirePageAccess } from "@/lib/auth/page-access";

import { saveMachineClassAction } from "../../actions";

export const metadata = { title: "New machine class" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function NewPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  await requirePageAccess(slug, "catalogue.edit", `/${slug}/drafting/machine-classes/new`);
  const prefill = machineClassPrefillSchema.parse(await searchParams);
  const fromGap = prefill.rpmMax !== undefined;
  return (
    <>
      <PageHeader
        title="New machine class"
        lead={
          fromGap
            ? "Prefilled with the median machine of a coverage gap in Field results: check every number against a real machine before you publish sheets for it."
            : undefined
        }
      />
      <MachineClassForm vendorSlug={slug} action={saveMachineClassAction} defaultValues={prefillDefaults(prefill)} />
    </>
  );
}
