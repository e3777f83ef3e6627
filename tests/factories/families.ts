import { cutterFieldsSchema } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { familyDefinitionSchema, familyRulesSchema, type FamilyRulesInput } from "@/content-schema/family";
import { createCutter } from "@/lib/catalogue/save-cutter";
import { saveMachineClass } from "@/lib/catalogue/save-machine-class";
import { saveMaterial } from "@/lib/catalogue/save-material";
import { createFamily } from "@/lib/families/save-family";

import { cutterInput } from "./catalogue";
import { createVendorWithStaff, uniq } from "./foundation";

// Invented test data: a small series of single-flute plastic cutters, cast acrylic, a light and a rigid router.

export const FAMILY_RULES: FamilyRulesInput = { kinds: ["slotting", "profile"], rules: [] };

export async function createFamilyScenario({ rules = FAMILY_RULES, cutters = 2 }: { rules?: FamilyRulesInput; cutters?: number } = {}) {
  const staff = await createVendorWithStaff();
  const vendorId = staff.vendor.id;
  const series = uniq("FS").toUpperCase();
  const made = [];
  for (let i = 0; i < cutters; i++) {
    const d = [3.175, 6.35, 4, 5][i % 4];
    made.push(
      await createCutter({
        vendorId,
        userId: null,
        fields: cutterFieldsSchema.parse(
          cutterInput({
            sku: `${series}-${i + 1}`,
            name: `Single-flute cutter ${d} mm no. ${i + 1}`,
            diameterMm: d,
            shankMm: d,
            fluteLengthMm: 3 * d + 3,
            overallLengthMm: 50,
          }),
        ),
      }),
    );
  }
  const material = await saveMaterial({
    vendorId,
    userId: null,
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
  const light = await saveMachineClass({
    vendorId,
    userId: null,
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
  const rigid = await saveMachineClass({
    vendorId,
    userId: null,
    fields: machineClassFieldsSchema.parse({
      slug: "rigid-router",
      name: "Rigid router",
      rpmMin: 6000,
      rpmMax: 24000,
      powerKw: 3,
      maxFeedMmMin: 15000,
      rigidity: 0.9,
      zThrustN: 1500,
    }),
  });
  const slug = uniq("family");
  const definition = familyDefinitionSchema.parse({
    name: "Acrylic series",
    slug,
    cutters: { series: `${series}-` },
    materialIds: [material.id],
    machineClassIds: [light.id, rigid.id],
  });
  await createFamily({ vendorId, userId: staff.engineer.user.id, definition, rules: familyRulesSchema.parse(rules) });
  const as = (userId: string) => ({ vendorId, userId, slug });
  return { ...staff, vendorId, slug, cutters: made, material, light, rigid, as };
}
