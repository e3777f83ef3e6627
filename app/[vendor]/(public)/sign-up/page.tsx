import { notFound } from "next/navigation";

import { SignUpForm } from "@/components/auth/sign-up-form";
import { findMembership } from "@/lib/auth/membership";
import { findSessionUser } from "@/lib/auth/session-user";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { joinAsCustomerAction, signUpAction } from "./actions";

export const metadata = { title: "Create an account" };

export default async function SignUpPage({ params }: { params: Promise<{ vendor: string }> }) {
  const vendor = await findVendorBySlug((await params).vendor);
  if (!vendor) notFound();
  const user = await findSessionUser();
  const member = user ? await findMembership(vendor.id, user.id) : null;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Create a customer account with {vendor.name}</h1>
      <p className="mt-2 text-stone-700">Save setups adapted to your machines, report results and ask the support team.</p>
      <div className="mt-6">
        {member ? (
          <p>You are already a member of {vendor.name}.</p>
        ) : user ? (
          <form action={joinAsCustomerAction}>
            <input type="hidden" name="vendor" value={vendor.slug} />
            <p className="mb-3">
              You are signed in as <span className="num">{user.email}</span>.
            </p>
            <button type="submit" className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
              Join {vendor.name} as a customer
            </button>
          </form>
        ) : (
          <SignUpForm signUpAction={signUpAction} vendor={vendor.slug} />
        )}
      </div>
    </div>
  );
}
