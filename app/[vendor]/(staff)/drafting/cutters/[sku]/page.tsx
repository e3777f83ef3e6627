import Link from "next/link";
import { notFound } from "next/navigation";

import { CutterForm } from "@/components/catalogue/catalogue-forms";
import { ImageUpload } from "@/components/catalogue/image-upload";
import { CutterCard } from "@/components/library/cutter-card";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { findDraftingCutter } from "@/lib/catalogue/page-data";

import { saveCutterAction } from "../../actions";

type Props = { params: Promise<{ vendor: string; sku: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, sku } = await params;
  return { title: (await findDraftingCutter(vendor, sku))?.sku ?? "Cutter" };
}

export default async function CutterDetailPage({ params }: Props) {
  const { vendor: slug, sku } = await params;
  const { vendor, member } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/cutters/${sku}`);
  const cutter = await findDraftingCutter(slug, sku);
  if (!cutter) notFound();
  const { id, shortCode, imageKey: _imageKey, updatedAt: _updatedAt, ...fields } = cutter;
  const editable = can(member?.role, "catalogue.edit");
  const lead = (
    <>
      Short code <span className="num">{shortCode}</span> ·{" "}
      <Link className="underline" href={`/${vendor.slug}/library/cutters/${encodeURIComponent(cutter.sku)}`}>
        Library page
      </Link>
    </>
  );
  return (
    <>
      <PageHeader title={`${cutter.sku}: ${cutter.name}`} lead={lead} />
      <div className="mb-8 grid gap-6 lg:grid-cols-2">
        <CutterCard cutter={cutter} units="metric" vendorSlug={vendor.slug} />
        {editable ? <ImageUpload url={`/${vendor.slug}/drafting/cutters/${encodeURIComponent(cutter.sku)}/image`} /> : null}
      </div>
      {editable ? (
        <section aria-labelledby="edit-heading">
          <h2 id="edit-heading" className="mb-3 text-lg font-semibold">
            Edit
          </h2>
          <CutterForm
            vendorSlug={vendor.slug}
            action={saveCutterAction}
            id={id}
            defaultValues={{
              ...fields,
              coating: fields.coating ?? "",
              cornerRadiusMm: fields.cornerRadiusMm ?? "",
              helixDeg: fields.helixDeg ?? "",
            }}
          />
        </section>
      ) : null}
    </>
  );
}
