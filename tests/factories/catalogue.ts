import { cutterFieldsSchema, type CutterFieldsInput } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { createCutter } from "@/lib/catalogue/save-cutter";
import { saveMachineClass } from "@/lib/catalogue/save-machine-class";
import { saveMaterial } from "@/lib/catalogue/save-material";

import { uniq } from "./foundation";

// Invented test data, matching tests/factories/sheet-source.ts (SKU SF-125-O, cast-acrylic, light-router).
export const cutterInput = (overrides: Partial<CutterFieldsInput> = {}): CutterFieldsInput => ({
  sku: uniq("T"),
  name: "Test single-flute cutter",
  diameterMm: 3.175,
  flutes: 1,
  fluteLengthMm: 12,
  overallLengthMm: 38,
  shankMm: 3.175,
  geometry: "single-flute",
  ...overrides,
});

export async function createCatalogue(vendorId: string, userId: string | null = null, sku = "SF-125-O") {
  const cutter = await createCutter({ vendorId, userId, fields: cutterFieldsSchema.parse(cutterInput({ sku })) });
  const material = await saveMaterial({
    vendorId,
    userId,
    fields: materialFieldsSchema.parse({
      slug: "cast-acrylic",
      name: "Cast acrylic",
      materialGroup: "plastics",
      vcMinMpm: 150,
      vcMaxMpm: 300,
      minChipLoadMm: 0.05,
      kcNmm2: 120,
      chipLoadMaxPctD: 3.5,
      cautions: "melting: Keep the feed up.",
    }),
  });
  const machineClass = await saveMachineClass({
    vendorId,
    userId,
    fields: machineClassFieldsSchema.parse({
      slug: "light-router",
      name: "Light router",
      rpmMin: 8000,
      rpmMax: 24000,
      powerKw: 0.8,
      maxFeedMmMin: 5000,
      rigidity: 0.4,
    }),
  });
  return { cutter, material, machineClass };
}
