import type { Metadata } from "next";
import { notFound } from "next/navigation";
import type { CSSProperties, ReactNode } from "react";

import { SafetyFooter } from "@/components/shell/safety-note";
import { VendorHeader } from "@/components/shell/vendor-header";
import { findMembership } from "@/lib/auth/membership";
import { findSessionUser } from "@/lib/auth/session-user";
import { inkFor } from "@/lib/ui/contrast";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

type Props = { children: ReactNode; params: Promise<{ vendor: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const vendor = await findVendorBySlug((await params).vendor);
  return { title: { default: vendor?.name ?? "Not found", template: `%s · ${vendor?.name ?? "Swarfbook"}` } };
}

export default async function VendorLayout({ children, params }: Props) {
  const vendor = await findVendorBySlug((await params).vendor);
  if (!vendor) notFound();
  const user = await findSessionUser();
  const member = user ? await findMembership(vendor.id, user.id) : null;
  const style = { "--vendor-accent": vendor.accentColor, "--vendor-accent-ink": inkFor(vendor.accentColor) } as CSSProperties;
  return (
    <div style={style} className="flex min-h-screen flex-col">
      <VendorHeader vendor={vendor} role={member?.role ?? null} userName={user ? user.name || user.email : null} />
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-8">
        {children}
      </main>
      <SafetyFooter />
    </div>
  );
}
