import Link from "next/link";
import { notFound } from "next/navigation";

import { ActionForm } from "@/components/drafting/action-form";
import { ReviewPreview } from "@/components/drafting/review-preview";
import { StateBadge } from "@/components/drafting/state-badge";
import { VersionTable } from "@/components/drafting/version-table";
import { WithdrawForm } from "@/components/drafting/withdraw-form";
import { readUnits } from "@/components/library/read-units";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { findDraftingSheetPage } from "@/lib/sheets/page-data";

import { approveDraftAction, newVersionAction, publishDraftAction, returnToDraftAction, withdrawAction } from "../actions";

type Props = { params: Promise<{ vendor: string; slug: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, slug } = await params;
  return { title: (await findDraftingSheetPage(vendor, slug))?.versions[0]?.title ?? "Sheet" };
}

const box = "rounded-md border border-stone-300 bg-white p-4";

export default async function DraftingSheetPage({ params }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  const { vendor, user, member } = await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/sheets/${slug}`);
  const data = await findDraftingSheetPage(vendorSlug, slug);
  if (!data) notFound();
  const { sheet, openDraft: draft, versions } = data;
  const hidden = { vendor: vendor.slug, slug: sheet.slug };
  const base = `/${vendor.slug}/drafting/sheets/${sheet.slug}`;
  const needsOther = vendor.settings.requireSecondApproval;
  const isAuthor = draft && (draft.authorId === user?.id || draft.updatedBy === user?.id);
  const withdrawable = versions.filter((v) => v.state === "published" || v.state === "superseded").map((v) => v.number);
  const [latest, previous] = versions;
  // The version a reviewer compares against: the newest one before the draft (drafts are numbered last).
  const previousVersion = draft
    ? (versions.find((v) => v.number < draft.number && v.state !== "draft" && v.state !== "in_review") ?? null)
    : null;
  const units = await readUnits();
  return (
    <>
      <PageHeader
        title={versions[0]?.title ?? sheet.slug}
        lead={
          <>
            <span className="num">{sheet.slug}</span> · <span className="num">{data.cutter.sku}</span> · {data.material.name} ·{" "}
            {data.machineClass.name}
          </>
        }
        actions={
          previous ? (
            <Link
              href={`${base}/diff?from=${previous.number}&to=${latest.number}`}
              className="min-h-11 rounded border border-stone-300 bg-white px-4 py-2 font-medium"
            >
              Compare versions
            </Link>
          ) : undefined
        }
      />
      <div className="mb-8 grid gap-4 lg:grid-cols-2">
        <section aria-labelledby="draft-heading" className={box}>
          <h2 id="draft-heading" className="mb-2 font-semibold">
            Open draft
          </h2>
          {!draft ? (
            <>
              <p className="mb-3 text-sm text-stone-700">No open draft. A new version starts as a copy of the latest one.</p>
              <ActionForm action={newVersionAction} hidden={hidden} submitLabel="Start a new version" />
            </>
          ) : (
            <div className="space-y-3">
              <p className="text-sm">
                Version <span className="num">{draft.number}</span> <StateBadge state={draft.state} /> · by {draft.authorName ?? "—"}
                {draft.approvedByName ? <> · ✓ approved by {draft.approvedByName}</> : null}
              </p>
              {draft.state === "draft" ? (
                <Link href={`${base}/edit`} className="inline-block min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
                  Edit the draft
                </Link>
              ) : null}
              {draft.state === "in_review" ? (
                <>
                  <p className="text-sm">Change note: {draft.changeNote}</p>
                  {!draft.approvedBy && can(member?.role, "sheets.review") ? (
                    isAuthor ? (
                      <p className="text-sm text-stone-600">
                        You wrote or last edited this version, so another engineer reviews and approves it.
                      </p>
                    ) : (
                      <ActionForm action={approveDraftAction} hidden={hidden} submitLabel="Approve" />
                    )
                  ) : null}
                  {(draft.approvedBy || !needsOther) && can(member?.role, "sheets.publish") ? (
                    <ActionForm
                      action={publishDraftAction}
                      hidden={hidden}
                      submitLabel={`Publish version ${draft.number}`}
                      confirm={{
                        question: previousVersion
                          ? `Publish version ${draft.number}? It replaces version ${previousVersion.number} in the Library for every customer.`
                          : `Publish version ${draft.number}? Every customer who can see the Library can read it.`,
                        yes: `Yes, publish version ${draft.number}`,
                      }}
                    />
                  ) : null}
                  <ActionForm action={returnToDraftAction} hidden={hidden} submitLabel="Return to draft" variant="quiet" />
                </>
              ) : null}
            </div>
          )}
        </section>
        {withdrawable.length && can(member?.role, "sheets.publish") ? (
          <section aria-labelledby="withdraw-heading" className={box}>
            <h2 id="withdraw-heading" className="mb-2 font-semibold">
              Withdraw
            </h2>
            <p className="mb-2 text-sm text-stone-700">A withdrawn version stays readable with a banner and your reason.</p>
            <WithdrawForm
              key={withdrawable.join()}
              action={withdrawAction}
              vendorSlug={vendor.slug}
              slug={sheet.slug}
              versions={withdrawable}
            />
          </section>
        ) : null}
      </div>
      {draft?.state === "in_review" ? (
        <div className="mb-8">
          <ReviewPreview vendorId={vendor.id} draft={draft} previous={previousVersion} cutter={data.cutter} refs={sheet} units={units} />
        </div>
      ) : null}
      <h2 className="mb-2 text-lg font-semibold">Versions</h2>
      <VersionTable versions={versions} libraryHref={(n) => `/${vendor.slug}/library/${sheet.slug}/v/${n}`} />
    </>
  );
}
