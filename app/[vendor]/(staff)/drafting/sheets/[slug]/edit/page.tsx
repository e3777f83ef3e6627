import Link from "next/link";
import { notFound } from "next/navigation";

import { SheetEditor } from "@/components/drafting/sheet-editor";
import { StateBadge } from "@/components/drafting/state-badge";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { findDraftingSheetPage } from "@/lib/sheets/page-data";

import { previewDraftAction, saveDraftAction, submitDraftAction } from "../../actions";

type Props = { params: Promise<{ vendor: string; slug: string }> };

export const metadata = { title: "Edit draft" };

export default async function EditDraftPage({ params }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/sheets/${slug}/edit`);
  const data = await findDraftingSheetPage(vendorSlug, slug);
  if (!data) notFound();
  const back = `/${vendorSlug}/drafting/sheets/${data.sheet.slug}`;
  const draft = data.openDraft;
  if (!draft || draft.state !== "draft") {
    return (
      <>
        <PageHeader title="Nothing to edit" />
        <p>
          {draft ? (
            <>
              Version {draft.number} is <StateBadge state={draft.state} />; return it to draft on{" "}
            </>
          ) : (
            "This sheet has no open draft; start a new version on "
          )}
          <Link className="underline" href={back}>
            the sheet&apos;s page
          </Link>
          .
        </p>
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`Edit version ${draft.number}: ${draft.title}`}
        lead={
          <>
            <Link className="underline" href={back}>
              Back to the sheet
            </Link>{" "}
            · <span className="num">{data.cutter.sku}</span> · {data.material.name} · {data.machineClass.name}
          </>
        }
      />
      {draft.changeNote ? (
        <p role="note" data-testid="draft-change-note" className="mb-4 rounded-md border border-amber-300 bg-amber-50 px-4 py-3 text-sm">
          <strong>This draft starts with a change note:</strong> {draft.changeNote} Edit it below before you submit.
        </p>
      ) : null}
      <SheetEditor
        vendorSlug={vendorSlug}
        slug={data.sheet.slug}
        initialSource={draft.source}
        initialRevision={draft.revision}
        initialChangeNote={draft.changeNote}
        saveAction={saveDraftAction}
        previewAction={previewDraftAction}
        submitAction={submitDraftAction}
      />
    </>
  );
}
