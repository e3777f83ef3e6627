import "server-only";

import { headers } from "next/headers";
import Link from "next/link";

import { findMembership } from "@/lib/auth/membership";
import { findSessionUser } from "@/lib/auth/session-user";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

/**
 * A signed-in person who is not a customer of a customers-only Library gets a 404 like any
 * other refusal, but told why and offered to join (the vendor's name and sign-up are public).
 * Null for every other 404.
 */
export async function PrivateLibraryNote() {
  const path = (await headers()).get("x-request-path") ?? "";
  const slug = /^\/([a-z0-9-]{1,63})\/library(?:\/|$)/.exec(path)?.[1];
  if (!slug) return null;
  const [vendor, user] = await Promise.all([findVendorBySlug(slug), findSessionUser()]);
  if (!vendor || !user || vendor.settings.libraryPublic || (await findMembership(vendor.id, user.id))) return null;
  return (
    <div className="mx-auto max-w-xl py-16" data-private-library>
      <h1 className="text-2xl font-semibold">This Library is for {vendor.name}&apos;s customers</h1>
      <p className="mt-2 text-stone-700">
        {vendor.name} shares its recipe sheets with its own customers only, and your account is not one of them yet. Join as a customer to
        read the sheets, adapt them to your machines and ask their support team.
      </p>
      <div className="mt-6 flex flex-wrap gap-3">
        <Link
          href={`/${vendor.slug}/sign-up`}
          className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-medium text-accent-ink"
        >
          Ask to join {vendor.name}
        </Link>
        <Link href="/" className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4">
          Back to Swarfbook
        </Link>
      </div>
    </div>
  );
}
