import { notFound } from "next/navigation";

import { MailPreferencesForm } from "@/components/mail/mail-preferences-form";
import { PageHeader } from "@/components/ui/page-header";
import { findPreferencesPerson } from "@/lib/mail-preferences/find-preferences-person";
import { kindsForRole, MAIL_KIND_TEXTS, mailKindSchema } from "@/lib/mail-preferences/mail-kinds";
import { listMailPreferences } from "@/lib/mail-preferences/mail-preferences";

import { saveMailPreferencesAction } from "./actions";

export const metadata = { title: "Mail preferences", robots: { index: false } };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };
const one = (v: string | string[] | undefined) => (typeof v === "string" && v.length <= 400 ? v : undefined);

// Reached from every mail's footer (a signed link, no sign-in needed) and from the header when signed in.
export default async function MailPreferencesPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const q = await searchParams;
  const token = one(q.token);
  const person = await findPreferencesPerson({ vendorSlug: slug, token });
  if (!person) notFound();
  const choices = await listMailPreferences({ vendorId: person.vendor.id, userId: person.userId });
  const stopped = mailKindSchema.safeParse(one(q.stopped));
  return (
    <>
      <PageHeader
        title="Mail preferences"
        lead={
          <>
            Which e-mails {person.vendor.name} sends to <span className="num">{person.email}</span>.
          </>
        }
      />
      <div role="status" className="mb-4 space-y-2">
        {stopped.success ? (
          <p className="rounded border border-stone-300 bg-stone-100 px-3 py-2">
            {MAIL_KIND_TEXTS[stopped.data].label}: off. Nothing more of this kind will come.
          </p>
        ) : null}
        {q.saved === "1" ? <p className="rounded border border-stone-300 bg-stone-100 px-3 py-2">✓ Saved.</p> : null}
      </div>
      {q.problem === "unreadable" ? (
        <p role="alert" className="mb-4 rounded border border-red-300 bg-red-50 px-3 py-2 text-red-900">
          Nothing was saved: the form came back changed or incomplete. Tick the boxes you want and save again.
        </p>
      ) : null}
      <MailPreferencesForm
        vendorSlug={person.vendor.slug}
        token={person.viaLink ? token : undefined}
        kinds={kindsForRole(person.role)}
        choices={choices}
        saveMailPreferencesAction={saveMailPreferencesAction}
      />
      <p className="mt-6 max-w-2xl text-sm text-stone-600">
        Sign-in links, address checks and invitations always come: they are sent only when you ask for them. These choices are for{" "}
        {person.vendor.name} only.
      </p>
    </>
  );
}
