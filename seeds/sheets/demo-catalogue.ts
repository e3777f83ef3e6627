// Invented demo data: fictional catalogues of two fictional vendors. Material properties (vc windows,
// minimum chip loads, kc, chip-load bands, Kienzle kc1.1 and mc for aluminium) are invented demo values or
// approximate values from memory, not from any chart. Wood windows start at 200 m/min so that the small
// cutters (3–4 mm) reach the window at a router's top speed. Chip-load bands are the group's typical band.
import type { CutterFieldsInput } from "@/content-schema/catalogue-cutter";
import type { MachineClassFieldsInput } from "@/content-schema/catalogue-machine-class";
import type { MaterialFieldsInput } from "@/content-schema/catalogue-material";

type Cutter = CutterFieldsInput & { sku: string };

const cutter = (sku: string, name: string, d: number, z: number, geometry: Cutter["geometry"], extra: Partial<Cutter> = {}): Cutter => ({
  sku,
  name,
  diameterMm: d,
  flutes: z,
  fluteLengthMm: Math.round(d * 3 * 10) / 10,
  overallLengthMm: Math.max(38, Math.round(d * 8)),
  shankMm: d < 3.175 ? 3.175 : d,
  cornerForm: "square",
  toolMaterial: "carbide",
  geometry,
  helixDeg: geometry === "single-flute" || geometry === "o-flute" ? 21 : 30,
  notes: "Invented demo cutter.",
  ...extra,
});

export const DEMO_CUTTERS: Record<string, Cutter[]> = {
  northbeck: [
    cutter("NB-SF-3175", "1/8 in single-flute plastic cutter", 3.175, 1, "single-flute", { coating: "polished" }),
    cutter("NB-SF-6350", "1/4 in single-flute plastic cutter", 6.35, 1, "single-flute", { coating: "polished" }),
    cutter("NB-2F-6", "6 mm two-flute up-cut end mill", 6, 2, "upcut"),
    cutter("NB-3F-6", "6 mm three-flute aluminium end mill", 6, 3, "straight", { coating: "ZrN", helixDeg: 38 }),
    cutter("NB-BN-6", "6 mm two-flute ball nose", 6, 2, "straight", { cornerForm: "ball", cornerRadiusMm: 3 }),
    cutter("NB-CMP-635", "1/4 in two-flute compression cutter", 6.35, 2, "compression"),
  ],
  quillon: [
    cutter("QC-O1-3", "3 mm O-flute plastic cutter", 3, 1, "o-flute"),
    cutter("QC-O1-6", "6 mm O-flute plastic cutter", 6, 1, "o-flute"),
    cutter("QC-E2-4", "4 mm two-flute down-cut end mill", 4, 2, "downcut"),
    cutter("QC-E3-8", "8 mm three-flute aluminium end mill", 8, 3, "straight", {
      coating: "DLC",
      helixDeg: 40,
      cornerForm: "corner-radius",
      cornerRadiusMm: 0.5,
    }),
    cutter("QC-B2-3", "3 mm two-flute ball nose", 3, 2, "straight", { cornerForm: "ball", cornerRadiusMm: 1.5 }),
    cutter("QC-CP-8", "8 mm two-flute compression cutter", 8, 2, "compression"),
  ],
};

const melting = {
  kind: "melting" as const,
  text: "Below the minimum chip load the cutter rubs; the heat melts the chips and welds them to the tool.",
};
const fire = { kind: "fire" as const, text: "Hot chips and dust can smoulder in the extraction; never leave a cut unattended." };
const dust = { kind: "dust" as const, text: "Fine dust: run dust extraction and wear a respirator." };

const material = (
  slug: string,
  name: string,
  group: MaterialFieldsInput["materialGroup"],
  vc: [number, number],
  minChip: number,
  kc: number,
  synonyms: string[],
  cautions: MaterialFieldsInput["cautions"],
  extra: Partial<MaterialFieldsInput> = {},
): MaterialFieldsInput => ({
  slug,
  name,
  materialGroup: group,
  vcMinMpm: vc[0],
  vcMaxMpm: vc[1],
  minChipLoadMm: minChip,
  kcNmm2: kc,
  synonyms,
  cautions,
  notes: "Invented demo values.",
  ...extra,
});

const COMMON_MATERIALS: MaterialFieldsInput[] = [
  material("cast-acrylic", "Cast acrylic", "plastics", [150, 300], 0.05, 120, ["PMMA", "plexi", "perspex"], [melting, fire]),
  material("hdpe", "HDPE", "plastics", [200, 450], 0.08, 60, ["polyethylene", "PE-HD"], [melting]),
  material("polycarbonate", "Polycarbonate", "plastics", [150, 300], 0.05, 130, ["PC", "lexan"], [melting]),
  material("mdf", "MDF", "wood", [200, 700], 0.06, 60, ["medium-density fibreboard"], [dust, fire]),
  material("plywood", "Birch plywood", "wood", [200, 650], 0.05, 70, ["ply", "baltic birch"], [dust]),
  material(
    "aluminium-6061",
    "Aluminium 6061",
    "non-ferrous",
    [150, 400],
    0.02,
    700,
    ["6061-T6", "aluminum", "alu"],
    [{ kind: "eye", text: "Aluminium chips fly far and are sharp: eye protection and a guard." }],
    { kc11Nmm2: 500, mc: 0.25 },
  ),
];

export const DEMO_MATERIALS: Record<string, MaterialFieldsInput[]> = {
  northbeck: [
    ...COMMON_MATERIALS,
    material("hardwood-oak", "Hardwood (white oak)", "wood", [200, 600], 0.05, 90, ["oak", "hardwood"], [dust, fire]),
    material(
      "g10-glass-epoxy",
      "G10 glass-epoxy laminate",
      "composites",
      [100, 250],
      0.03,
      250,
      ["G10", "FR4", "glass fibre"],
      [dust, { kind: "general", text: "Abrasive: the cutting edge dulls fast; check it often." }],
    ),
  ],
  quillon: [
    ...COMMON_MATERIALS,
    material("hardwood-maple", "Hardwood (hard maple)", "wood", [200, 600], 0.05, 95, ["maple", "hardwood"], [dust, fire]),
    material(
      "carbon-fibre",
      "Carbon-fibre laminate",
      "composites",
      [100, 250],
      0.03,
      280,
      ["CFRP", "carbon fiber"],
      [dust, { kind: "general", text: "Conductive dust: keep it out of the electronics cabinet." }],
    ),
  ],
};

export const DEMO_MACHINE_CLASSES: Record<string, MachineClassFieldsInput[]> = {
  northbeck: [
    {
      slug: "light-router",
      name: "Light belt-drive router",
      description: "Hobby-class gantry router with belt drives and a trim-router or 0.8 kW spindle.",
      rpmMin: 8000,
      rpmMax: 24000,
      powerKw: 0.8,
      maxFeedMmMin: 5000,
      rigidity: 0.4,
      zThrustN: 150,
      spindleKind: "constant-torque",
      ratedRpm: 24000,
    },
    {
      slug: "rigid-router",
      name: "Rigid ball-screw router",
      description: "Steel-frame router with ball screws and a 2.2 kW water-cooled spindle.",
      rpmMin: 6000,
      rpmMax: 24000,
      powerKw: 2.2,
      maxFeedMmMin: 15000,
      rigidity: 0.7,
      zThrustN: 400,
      spindleKind: "constant-torque",
      ratedRpm: 24000,
    },
  ],
  quillon: [
    {
      slug: "light-router",
      name: "Light belt-drive router",
      description: "Desktop router with belt drives and a 0.5 kW spindle.",
      rpmMin: 10000,
      rpmMax: 30000,
      powerKw: 0.5,
      maxFeedMmMin: 4000,
      rigidity: 0.35,
      zThrustN: 120,
      spindleKind: "constant-power",
    },
    {
      slug: "rigid-router",
      name: "Rigid ball-screw router",
      description: "Production router, 3.7 kW spindle, ball screws.",
      rpmMin: 6000,
      rpmMax: 24000,
      powerKw: 3.7,
      maxFeedMmMin: 20000,
      rigidity: 0.75,
      zThrustN: 600,
      spindleKind: "constant-torque",
      ratedRpm: 24000,
    },
    {
      slug: "small-machining-centre",
      name: "Small machining centre",
      description: "Compact vertical machining centre with a BT30 spindle.",
      rpmMin: 500,
      rpmMax: 12000,
      powerKw: 5.5,
      maxFeedMmMin: 10000,
      rigidity: 1,
      zThrustN: 2000,
      spindleKind: "constant-power",
    },
  ],
};
