import type { OperationKind } from "@/content-schema/sheet-kinds";

import { deriveOperation, type DeriveCutter, type DeriveMachine, type DeriveMaterial } from "./derive-starting-data";
import { buildSheetSourceText } from "./sheet-template";

type Named<T> = T & { name: string };

/** A first draft for a new sheet: derived starting numbers the engineer then replaces with tested ones. */
export function newSheetSource({
  cutter,
  material,
  machineClass,
  kinds = ["slotting", "profile"],
}: {
  cutter: Named<DeriveCutter> & { sku: string };
  material: Named<DeriveMaterial> & { slug: string };
  machineClass: Named<DeriveMachine> & { slug: string };
  kinds?: OperationKind[];
}): string {
  const operations = kinds.map((kind) => deriveOperation({ cutter, material, machine: machineClass, kind }));
  return buildSheetSourceText({
    title: `${material.name}, ${cutter.name}`,
    summary: `Starting data for ${material.name} with ${cutter.sku} on a ${machineClass.name.toLowerCase()}.`,
    cutterSku: cutter.sku,
    materialSlug: material.slug,
    machineClassSlug: machineClass.slug,
    operations,
    body: [
      "## Before you cut",
      "",
      "These numbers are derived from the formulas, not yet from test cuts. Replace them with tested values.",
      "",
      '<Caution kind="general" title="Starting point">',
      "Start at the numbers below and adjust by ear and by chip.",
      "</Caution>",
    ].join("\n"),
  });
}
