import { buildSheetSourceText } from "@/lib/sheets/sheet-template";

import type { CellCatalogue, CellOperation } from "./derive-cell";

// Pure: the whole sheet source of a generated cell. Its prose says how the numbers were found: the family, the
// rules version, and per operation the rules that set them (the rest from the material's own data).

export type FamilyRef = { name: string; ruleVersion: number };

/** Family names are free text; in MDX prose only plain words and punctuation are kept. */
const plain = (text: string) =>
  text
    .replace(/[^\p{L}\p{N} .,'()/&+-]/gu, "")
    .replace(/\s+/g, " ")
    .trim();

export function provenanceLines(family: FamilyRef, operations: CellOperation[]): string[] {
  return operations.map((op) => {
    const by = op.rules.length ? `rule${op.rules.length > 1 ? "s" : ""} ${op.rules.join(", ")}` : "no rule of its own";
    return `- ${op.operation.label ?? op.operation.kind}: ${by}, rules version ${family.ruleVersion}; what no rule sets comes from the material's own data.`;
  });
}

export function cellSource(cell: CellCatalogue, family: FamilyRef, operations: CellOperation[]): string {
  const { cutter, material, machineClass } = cell;
  return buildSheetSourceText({
    title: `${material.name}, ${cutter.name}`.slice(0, 120),
    summary: `Starting data for ${material.name} with ${cutter.sku} on a ${machineClass.name.toLowerCase()}.`.slice(0, 400),
    cutterSku: cutter.sku,
    materialSlug: material.slug,
    machineClassSlug: machineClass.slug,
    operations: operations.map((op) => op.derived),
    cautions: material.cautions,
    body: [
      "## How these numbers were found",
      "",
      `Derived by the cutting-data engine for the sheet family “${plain(family.name)}”, rules version ${family.ruleVersion}, and reviewed as a batch before publishing.`,
      "",
      ...provenanceLines(family, operations),
      "",
      '<Caution kind="general" title="Starting point">',
      "Start at the numbers below and adjust by ear and by chip.",
      "</Caution>",
    ].join("\n"),
  });
}
