import { isUuid } from "@/lib/ids/is-uuid";
import { searchSettings } from "@/search/settings";

import type { QueryParts } from "../engine-types";

/** A filter string value: double-quoted, backslashes and quotes escaped, so no value can end the expression. */
export const quote = (value: string) => `"${value.replace(/\\/g, "\\\\").replace(/"/g, '\\"')}"`;
const list = (values: readonly string[]) => `[${values.map(quote).join(", ")}]`;
const num = (n: number) => {
  if (!Number.isFinite(n)) throw new Error("Filter numbers must be finite.");
  // Rounded to a micrometre, so 3.175 + 0.01 reads 3.185 and not 3.1849999999999996.
  return String(Math.round(n * 1e6) / 1e6);
};

/** Every search starts with this: one shared index, and the vendor filter is always applied. */
export function vendorFilter(vendorId: string): string {
  if (!isUuid(vendorId)) throw new Error("vendorId must be a UUID.");
  return `vendorId = ${quote(vendorId)}`;
}

export function buildMeiliFilter(vendorId: string, kind: "sheet" | "cutter", parts: QueryParts): string {
  const out = [vendorFilter(vendorId), `kind = ${quote(kind)}`];
  const tol = searchSettings.diameterToleranceMm;
  if (parts.materialKeys?.length) out.push(`materialKey IN ${list(parts.materialKeys)}`);
  if (parts.materialGroups?.length) out.push(`materialGroup IN ${list(parts.materialGroups)}`);
  for (const op of parts.operations ?? []) out.push(`operations = ${quote(op)}`);
  if (parts.diameterMm !== undefined) out.push(`diameterMm ${num(parts.diameterMm - tol)} TO ${num(parts.diameterMm + tol)}`);
  if (parts.flutes !== undefined) out.push(`flutes = ${num(parts.flutes)}`);
  if (parts.cornerForms?.length) out.push(`cornerForm IN ${list(parts.cornerForms)}`);
  if (parts.geometry?.length) out.push(`geometry IN ${list(parts.geometry)}`);
  if (parts.machineClass) out.push(`machineClass = ${quote(parts.machineClass)}`);
  if (parts.skus?.length) out.push(`cutterSku IN ${list(parts.skus)}`);
  return out.join(" AND ");
}
