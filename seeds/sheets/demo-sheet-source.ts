// Invented demo data: sheet sources whose numbers are derived in code by the engine's rules
// (lib/sheets/derive-starting-data.ts); versions published before the rules were revised keep the numbers
// they were published with (first-edition-numbers.ts).
import type { CutterFieldsInput } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema, type MachineClassFieldsInput } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema, type MaterialFieldsInput } from "@/content-schema/catalogue-material";
import { operationKindLabels } from "@/content-schema/sheet-kinds";
import { deriveOperation } from "@/lib/sheets/derive-starting-data";
import { buildSheetSourceText } from "@/lib/sheets/sheet-template";

import type { PlannedSheet, PlannedVersion } from "./demo-sheet-plan";
import { firstEditionOperation } from "./first-edition-numbers";

type Parts = {
  cutter: CutterFieldsInput & { sku: string };
  material: MaterialFieldsInput;
  machineClass: MachineClassFieldsInput;
  sheet: PlannedSheet;
  version: PlannedVersion;
};

/** The catalogue rows as the derivation reads them, parsed by the catalogue schemas (the band in % of D, the Z thrust). */
export function deriveParts({ cutter, material, machineClass }: Pick<Parts, "cutter" | "material" | "machineClass">) {
  const m = materialFieldsSchema.parse(material);
  const k = machineClassFieldsSchema.parse(machineClass);
  const c = {
    diameterMm: Number(cutter.diameterMm),
    flutes: Number(cutter.flutes),
    cornerForm: cutter.cornerForm ?? "square",
    fluteLengthMm: Number(cutter.fluteLengthMm),
  };
  return { c, m, k };
}

export function demoSheetSource({ cutter, material, machineClass, sheet, version }: Parts): string {
  const { c, m, k } = deriveParts({ cutter, material, machineClass });
  const derive = version.derivation === "first-edition" ? firstEditionOperation : deriveOperation;
  const operations = sheet.kinds.map((kind) =>
    derive({ cutter: c, material: m, machine: k, kind, chipLoadScale: version.chipLoadScale, depthScale: version.depthScale }),
  );
  const first = operations[0];
  const current = version.derivation !== "first-edition";
  const isPlastic = material.materialGroup === "plastics";
  const body = [
    "## About this sheet",
    "",
    `Invented demo data. The numbers are derived from the formulas: n from a cutting speed of about ${Math.round(first.derived.vcMpm)} m/min inside the material window,`,
    `vf = fz · z · n with a chip load of about ${first.derived.fzMm.toFixed(3)} mm per tooth for the first operation. They are starting points, not test results.`,
    ...(current
      ? [
          "",
          `The chip the edge sees (hex) stays inside the material's band of ${m.chipLoadMinPctD ?? "typical"}–${m.chipLoadMaxPctD ?? "typical"} % of D: light passes are fed up for chip thinning,`,
          `a full-width slot runs at 75 % of the pocketing chip, and the plunge feed comes from the Z thrust of the ${machineClass.name.toLowerCase()}, not from the cutting feed.`,
        ]
      : []),
    "",
    "## Workholding",
    "",
    `Hold the ${material.name.toLowerCase()} flat: vacuum table, screws outside the cut, or double-sided tape for thin sheet.`,
    "",
    isPlastic ? '<Caution kind="melting" title="Keep the chips moving">' : '<Caution kind="dust" title="Extraction on">',
    isPlastic
      ? "Use air blast and keep the feed up. A cutter that dwells melts the plastic and welds the chips."
      : "Run the dust extraction for the whole cut, and for a minute after.",
    "</Caution>",
    "",
    "## Operations",
    "",
    ...sheet.kinds.map((kind) => `- **${operationKindLabels[kind]}**: see the table for n, vf, ap and ae.`),
    "",
  ].join("\n");
  return buildSheetSourceText({
    title: `${material.name}, ${cutter.name}`,
    summary: `Invented demo data: ${sheet.kinds.map((kd) => operationKindLabels[kd].toLowerCase()).join(" and ")} in ${material.name.toLowerCase()} with ${cutter.sku} on a ${machineClass.name.toLowerCase()}.`,
    cutterSku: cutter.sku,
    materialSlug: material.slug,
    machineClassSlug: machineClass.slug,
    operations,
    cautions: isPlastic
      ? [{ kind: "melting", text: `Stay above ${material.minChipLoadMm} mm per tooth: below it the cutter rubs and melts the cut.` }]
      : [],
    tags: ["demo", material.materialGroup],
    body,
  });
}
