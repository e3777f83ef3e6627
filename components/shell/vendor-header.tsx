import Link from "next/link";

import { ShellSearchBox } from "@/components/search/shell-search-box";
import type { Vendor } from "@/content-schema/vendor";
import { AREAS, can } from "@/lib/auth/permissions";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { inkFor } from "@/lib/ui/contrast";

import { AccountArea } from "./account-area";

type Props = { vendor: Vendor; role: Role | null; userName: string | null };

export function VendorHeader({ vendor, role, userName }: Props) {
  const areas = AREAS.filter((area) => (area.key === "library" ? true : can(role, area.permission)));
  const ink = inkFor(vendor.accentColor);
  return (
    <header data-shell style={{ backgroundColor: vendor.accentColor, color: ink }}>
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href={`/${vendor.slug}/library`} className="flex items-center gap-3 font-semibold">
          {vendor.hasLogo ? (
            // eslint-disable-next-line @next/next/no-img-element -- the logo is served by our own route with its own headers
            <img src={`/api/v1/vendors/${vendor.slug}/logo`} alt="" width={32} height={32} className="h-8 w-8 rounded bg-white/90 p-0.5" />
          ) : null}
          <span className="text-lg">{vendor.name}</span>
        </Link>
        <nav data-shell aria-label="Areas" className="flex flex-wrap gap-1">
          {areas.map((area) => (
            <Link key={area.key} href={`/${vendor.slug}/${area.href}`} className="rounded px-3 py-2 text-sm font-medium hover:bg-black/10">
              {area.label}
            </Link>
          ))}
        </nav>
        <ShellSearchBox vendorSlug={vendor.slug} />
        <AccountArea
          userName={userName}
          roleLabel={role ? ROLE_LABELS[role] : null}
          signInHref={`/sign-in?vendor=${vendor.slug}&callbackUrl=/${vendor.slug}/library`}
          signUpHref={`/${vendor.slug}/sign-up`}
          links={[
            ...(role ? [{ href: `/${vendor.slug}/mail-preferences`, label: "Mail preferences" }] : []),
            { href: "/account", label: "Your account" },
          ]}
        />
      </div>
    </header>
  );
}
