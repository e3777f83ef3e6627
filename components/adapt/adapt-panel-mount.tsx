import "server-only";

import { findMembership } from "@/lib/auth/membership";
import { can } from "@/lib/auth/permissions";
import { getSessionUser } from "@/lib/auth/session-user";
import { listMachines } from "@/lib/bench/machines";
import { findAdaptContext } from "@/lib/adapt/page-data";
import type { UnitSystem } from "@/lib/machining";
import type { AdaptStart } from "@/lib/adapt/readapt-start";

import { AdaptPanel } from "./adapt-panel";
import { LazyAdaptPanel } from "./lazy-adapt-panel";
import type { SaveSetupAction } from "./save-setup-form";

type Props = {
  vendor: { id: string; slug: string };
  versionId: string;
  operationIndex: number;
  units: UnitSystem;
  returnTo: string;
  /** Load the panel's code when it scrolls into view (Library pages) instead of with the page. */
  lazy?: boolean;
  start?: AdaptStart;
  /** The Bench's save action, from the page; offered to a signed-in customer on a readable version. */
  saveSetupAction: SaveSetupAction;
};

/** Server side of the adapt panel: the sheet-derived inputs and, for a signed-in customer, their machines. */
export async function AdaptPanelMount({ vendor, versionId, operationIndex, units, returnTo, lazy = false, start, saveSetupAction }: Props) {
  const [context, user] = await Promise.all([findAdaptContext(vendor.id, versionId), getSessionUser()]);
  if (!context || !context.operations.length) return <p className="mt-1 text-sm text-stone-600">This version cannot be adapted.</p>;
  const member = user ? await findMembership(vendor.id, user.id) : null;
  const benchUser = user && member && can(member.role, "bench.use") ? user : null;
  const machines = benchUser ? await listMachines({ vendorId: vendor.id, userId: benchUser.id }) : [];
  const Panel = lazy ? LazyAdaptPanel : AdaptPanel;
  return (
    <Panel
      context={context}
      operationIndex={operationIndex}
      machines={machines}
      initialMachineId={start?.machineId}
      initialOverrides={start?.overrides}
      units={machines[0]?.units ?? units}
      vendorSlug={vendor.slug}
      saveAction={benchUser && context.versionState !== "withdrawn" ? saveSetupAction : undefined}
      signInHref={user ? undefined : `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}&vendor=${encodeURIComponent(vendor.slug)}`}
    />
  );
}

/** For the Library pages: `renderAdaptPanel` of getCompiledSheet / SheetView. */
export function adaptPanelRenderer(options: Omit<Props, "operationIndex" | "lazy">) {
  return function renderAdaptPanel({ index }: { index: number }) {
    return <AdaptPanelMount {...options} operationIndex={index} lazy />;
  };
}
