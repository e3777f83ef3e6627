import type { ReactNode } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import type { Permission } from "@/lib/auth/permissions";

type LayoutProps = { children: ReactNode; params: Promise<{ vendor: string }> };

/**
 * A layout that decides access for a whole area. It sits above the area's loading boundary,
 * so a refusal is a real 404 status or redirect rather than a streamed one.
 */
export function areaLayout(permission: Permission, area: string) {
  return async function AreaLayout({ children, params }: LayoutProps) {
    const { vendor } = await params;
    await requirePageAccess(vendor, permission, `/${vendor}/${area}`);
    return children;
  };
}
