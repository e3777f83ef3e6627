import { redirect } from "next/navigation";

import { requirePageAccess } from "@/lib/auth/page-access";

export default async function VendorHome({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor } = await params;
  await requirePageAccess(vendor, "library.read", `/${vendor}/library`);
  redirect(`/${vendor}/library`);
}
