import type { ReactNode } from "react";

import { PageHeader } from "@/components/ui/page-header";

/** A material's or machine class's Drafting page: what it holds, then its edit form for those who may edit. */
export function CatalogueItemView({ title, detail, editForm }: { title: string; detail: ReactNode; editForm: ReactNode | null }) {
  return (
    <>
      <PageHeader title={title} />
      {detail}
      {editForm ? (
        <section aria-labelledby="edit-heading" className="mt-8">
          <h2 id="edit-heading" className="mb-3 text-lg font-semibold">
            Edit
          </h2>
          {editForm}
        </section>
      ) : null}
    </>
  );
}
