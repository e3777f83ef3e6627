import "server-only";

import type { AdaptContext } from "@/lib/adapt/adapt-context";
import type { AdaptStart } from "@/lib/adapt/readapt-start";
import { findMembership } from "@/lib/auth/membership";
import { can } from "@/lib/auth/permissions";
import { findSessionUser } from "@/lib/auth/session-user";
import { listMachines } from "@/lib/bench/machines";
import type { UnitSystem } from "@/lib/machining";

import type { AdaptPanelProps } from "./adapt-panel";
import type { SaveSetupAction } from "./save-setup-form";

export type AdaptMountOptions = {
  vendor: { id: string; slug: string };
  versionId: string;
  operationIndex: number;
  units: UnitSystem;
  returnTo: string;
  start?: AdaptStart;
  /** The Bench's save action, from the page; offered to a signed-in customer on a readable version. */
  saveSetupAction: SaveSetupAction;
};

/** The panel's props for this reader: the sheet-derived inputs and, for a signed-in customer, their machines. */
export async function adaptPanelProps(
  context: AdaptContext,
  { vendor, operationIndex, units, returnTo, start, saveSetupAction }: AdaptMountOptions,
): Promise<AdaptPanelProps> {
  const user = await findSessionUser();
  const member = user ? await findMembership(vendor.id, user.id) : null;
  const benchUser = user && member && can(member.role, "bench.use") ? user : null;
  const machines = benchUser ? await listMachines({ vendorId: vendor.id, userId: benchUser.id }) : [];
  return {
    context,
    operationIndex,
    machines,
    initialMachineId: start?.machineId,
    initialOverrides: start?.overrides,
    // The reader's one units preference (the cookie), whatever units their machines were typed in.
    units,
    vendorSlug: vendor.slug,
    saveAction: benchUser && context.versionState !== "withdrawn" ? saveSetupAction : undefined,
    signInHref: user ? undefined : `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}&vendor=${encodeURIComponent(vendor.slug)}`,
  };
}

export const NOT_ADAPTABLE = "This version cannot be adapted.";
