import "server-only";

import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { requireMember, type VendorAccess } from "@/lib/auth/access";
import { findSetup } from "@/lib/bench/list-setups";
import { findMachine } from "@/lib/bench/machines";
import { setupSheetData } from "@/lib/bench/setup-sheet-data";
import { NotFound } from "@/lib/errors/domain-errors";
import { appUrl } from "@/lib/http/app-url";

/** The setup sheet's data for the PDF and CSV routes; only the owner finds it. */
export async function loadSetupSheet(access: VendorAccess, setupId: string) {
  requireMember(access);
  const setup = await findSetup({ vendorId: access.vendor.id, userId: access.user.id, setupId });
  if (!setup) throw new NotFound();
  const [context, machine] = await Promise.all([
    findVersionAdaptContext({ vendorId: access.vendor.id, versionId: setup.sheetVersionId }),
    findMachine({ vendorId: access.vendor.id, userId: access.user.id, machineId: setup.machineId }),
  ]);
  if (!context) throw new NotFound();
  const data = setupSheetData({
    context,
    operationIndex: setup.operationIndex,
    result: setup.result,
    setupName: setup.name,
    machineName: setup.machineName,
    units: setup.units,
    overrides: setup.overrides,
    machineStickoutMm: machine?.stickoutMm ?? null,
  });
  const versionUrl = appUrl(`/${access.vendor.slug}/library/${context.sheetSlug}/v/${context.versionNumber}`);
  const fileName = `setup-${context.sheetSlug}-v${context.versionNumber}`.replace(/[^a-z0-9-]/gi, "-").slice(0, 80);
  return { data, versionUrl, fileName, vendorName: access.vendor.name };
}
