import "server-only";

import type { Machine } from "@/lib/bench/machine-rows";
import { listMachines } from "@/lib/bench/machines";
import { listMachineClasses } from "@/lib/catalogue/list-catalogue";
import { listPublishedSheets, type PublishedSheetSummary } from "@/lib/sheets/list-published-sheets";

import { listMyCutters, type MyCutter } from "./my-cutters";
import { classFits, fittingClassIds } from "./shop-fit";

type Owner = { vendorId: string; userId: string };

/** "Fits my shop" as Library filters: my cutters × the classes that fit my machines. */
export async function findShopFilter(
  owner: Owner,
): Promise<{ cutterIds: string[]; machineClassIds: string[]; cutters: number; machines: number }> {
  const [cutters, machines, classes] = await Promise.all([
    listMyCutters(owner),
    listMachines(owner),
    listMachineClasses({ vendorId: owner.vendorId }),
  ]);
  return {
    cutterIds: cutters.map((c) => c.id),
    machineClassIds: fittingClassIds(machines, classes),
    cutters: cutters.length,
    machines: machines.length,
  };
}

export type CutterShopSheets = { cutter: MyCutter; machines: { machine: Pick<Machine, "id" | "name">; sheets: PublishedSheetSummary[] }[] };

/** For each of my cutters and each of my machines, the current published sheets whose machine class fits that machine. */
export async function listMyCutterSheets(owner: Owner): Promise<CutterShopSheets[]> {
  const [cutters, machines, classes] = await Promise.all([
    listMyCutters(owner),
    listMachines(owner),
    listMachineClasses({ vendorId: owner.vendorId }),
  ]);
  if (!cutters.length) return [];
  const sheets = await listPublishedSheets({ vendorId: owner.vendorId, filters: { cutterIds: cutters.map((c) => c.id) } });
  const fits = new Map(machines.map((m) => [m.id, new Set(classes.filter((k) => classFits(m, k)).map((k) => k.id))]));
  return cutters.map((cutter) => ({
    cutter,
    machines: machines.map((m) => ({
      machine: { id: m.id, name: m.name },
      sheets: sheets.filter((s) => s.cutterId === cutter.id && fits.get(m.id)?.has(s.machineClassId)),
    })),
  }));
}
