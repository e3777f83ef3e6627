import Link from "next/link";

import { listVendors } from "@/lib/vendors/get-vendor";

export const dynamic = "force-dynamic";

export default async function PlatformHome() {
  const vendors = await listVendors();
  return (
    <>
      <h1 className="text-3xl font-semibold tracking-tight">Cutting data from your tool vendor, adapted to your machine</h1>
      <p className="mt-3 max-w-2xl text-stone-700">
        Each vendor publishes reviewed, versioned recipe sheets for its cutters. Find the sheet for your cutter and material, scale it to
        your machine with the reasons shown, save the setup and ask the vendor when a cut goes wrong.
      </p>
      <h2 className="mt-10 mb-3 text-lg font-semibold">Vendors</h2>
      {vendors.length === 0 ? (
        <p className="text-stone-600">No vendor workspaces yet.</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {vendors.map((v) => (
            <li key={v.id}>
              <Link
                href={`/${v.slug}/library`}
                className="flex items-center gap-3 rounded-lg border border-stone-200 bg-white p-4 hover:border-stone-400"
              >
                <span aria-hidden className="h-8 w-2 rounded" style={{ backgroundColor: v.accentColor }} />
                <span className="font-medium">{v.name}</span>
                <span className="num ml-auto text-sm text-stone-500">/{v.slug}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
