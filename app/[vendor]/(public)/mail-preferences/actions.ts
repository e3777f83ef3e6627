"use server";

import { notFound, redirect } from "next/navigation";
import { z } from "zod";

import { findPreferencesPerson } from "@/lib/mail-preferences/find-preferences-person";
import { kindsForRole, MAIL_KINDS } from "@/lib/mail-preferences/mail-kinds";
import { saveMailPreferences } from "@/lib/mail-preferences/mail-preferences";
import { vendorSlugSchema } from "@/lib/vendors/reserved-slugs";

const tokenSchema = z.string().max(400).optional();
const inputSchema = z.object({
  vendor: z.string().min(1).max(80),
  token: tokenSchema,
  ...Object.fromEntries(MAIL_KINDS.map((k) => [k, z.literal("on").optional()])),
});

/** Where a form that cannot be read goes: back to its own page with the reason, never a silent jump elsewhere. */
function unreadableForm(form: FormData): never {
  const slug = vendorSlugSchema.safeParse(form.get("vendor"));
  if (!slug.success) notFound();
  const token = tokenSchema.safeParse(form.get("token") ?? undefined);
  const query = new URLSearchParams({ problem: "unreadable", ...(token.success && token.data ? { token: token.data } : {}) });
  redirect(`/${slug.data}/mail-preferences?${query}`);
}

/** Saves the boxes the page showed for this person's role: a shown box left unticked turns that mail off. */
export async function saveMailPreferencesAction(form: FormData): Promise<void> {
  const parsed = inputSchema.safeParse(Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === "string" && v !== "")));
  if (!parsed.success) unreadableForm(form);
  const { vendor: slug, token } = parsed.data;
  const person = await findPreferencesPerson({ vendorSlug: slug, token });
  if (!person) redirect(`/${encodeURIComponent(slug)}/mail-preferences`);
  const values = parsed.data as Record<string, string | undefined>;
  const choices = Object.fromEntries(kindsForRole(person.role).map((kind) => [kind, values[kind] === "on"]));
  await saveMailPreferences({ vendorId: person.vendor.id, userId: person.userId, choices });
  const query = new URLSearchParams({ saved: "1", ...(token ? { token } : {}) });
  redirect(`/${person.vendor.slug}/mail-preferences?${query}`);
}
