import Link from "next/link";
import { notFound } from "next/navigation";

import { MailPreferencesForm } from "@/components/mail/mail-preferences-form";
import { PageHeader } from "@/components/ui/page-header";
import { findPreferencesPerson } from "@/lib/mail-preferences/find-preferences-person";
import { kindsForRole, MAIL_KIND_TEXTS, mailKindSchema } from "@/lib/mail-preferences/mail-kinds";
import { listMailPreferences } from "@/lib/mail-preferences/mail-preferences";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { saveMailPreferencesAction } from "./actions";

export const metadata = { title: "Mail preferences", robots: { index: false } };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };
const one = (v: string | string[] | undefined) => (typeof v === "string" && v.length <= 400 ? v : undefined);

/** A link from a mail that no longer opens anything: an old or altered link, or a person no longer a member. */
function ExpiredLink({ vendorSlug }: { vendorSlug: string }) {
  const signIn = `/sign-in?callbackUrl=${encodeURIComponent(`/${vendorSlug}/mail-preferences`)}`;
  return (
    <>
      <PageHeader title="Mail preferences" lead="This link no longer opens your mail preferences." />
      <div role="alert" className="max-w-2xl space-y-3 rounded border border-amber-400 bg-amber-50 px-4 py-3">
        <p>The link is too old, was changed on its way, or its account is no longer a member here. Nothing was changed.</p>
        <p>
          Use the link in a newer mail, or{" "}
          <Link className="underline" href={signIn}>
            sign in
          </Link>{" "}
          to see your mail preferences.
        </p>
      </div>
    </>
  );
}

// Reached from every mail's footer (a signed link, no sign-in needed) and from the header when signed in.
export default async function MailPreferencesPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const q = await searchParams;
  const token = one(q.token);
  const person = await findPreferencesPerson({ vendorSlug: slug, token });
  if (!person) {
    const vendor = token ? await findVendorBySlug(slug) : null;
    if (!vendor) notFound();
    return <ExpiredLink vendorSlug={vendor.slug} />;
  }
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
