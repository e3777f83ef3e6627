import type { CutterFieldsInput } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema, type MachineClassFieldsInput } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema, type MaterialFieldsInput } from "@/content-schema/catalogue-material";
import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import type { AdaptContext, BenchMachineInput } from "@/lib/adapt/adapt-context";
import { toContextOperation } from "@/lib/adapt/read-front-matter";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { DEMO_CUTTERS, DEMO_MACHINE_CLASSES, DEMO_MATERIALS } from "@/seeds/sheets/demo-catalogue";
import { DEMO_SHEET_PLAN, demoSheetSlug, seededVersions, type PlannedSheet, type PlannedVersion } from "@/seeds/sheets/demo-sheet-plan";
import { demoSheetSource } from "@/seeds/sheets/demo-sheet-source";

// The demo sheets as the app reads them: each seeded version's source validated, and the adapt context the
// Bench would build from its front matter and catalogue rows (the same mapping as lib/adapt/find-version-adapt-context.ts).

export type DemoVersion = {
  vendor: string;
  slug: string;
  number: number;
  sheet: PlannedSheet;
  version: PlannedVersion;
  cutter: CutterFieldsInput & { sku: string };
  material: MaterialFieldsInput;
  machineClass: MachineClassFieldsInput;
  frontMatter: SheetFrontMatter;
  context: AdaptContext;
};

export function demoVersions(): DemoVersion[] {
  return Object.entries(DEMO_SHEET_PLAN).flatMap(([vendor, plan]) =>
    plan.flatMap((sheet) => {
      const cutter = DEMO_CUTTERS[vendor].find((c) => c.sku === sheet.cutter)!;
      const material = DEMO_MATERIALS[vendor].find((m) => m.slug === sheet.material)!;
      const machineClass = DEMO_MACHINE_CLASSES[vendor].find((k) => k.slug === sheet.machineClass)!;
      return seededVersions(sheet).map((version, i) => {
        const source = demoSheetSource({ cutter, material, machineClass, sheet, version });
        const validated = validateSheetSource(source);
        if (!validated.ok)
          throw new Error(`${vendor}/${demoSheetSlug(sheet)} v${i + 1}: ${validated.issues.map((x) => x.message).join("; ")}`);
        const frontMatter = validated.frontMatter;
        return {
          vendor,
          slug: demoSheetSlug(sheet),
          number: i + 1,
          sheet,
          version,
          cutter,
          material,
          machineClass,
          frontMatter,
          context: contextOf(cutter, material, machineClass, frontMatter, i + 1),
        };
      });
    }),
  );
}

function contextOf(
  cutter: CutterFieldsInput & { sku: string },
  materialInput: MaterialFieldsInput,
  classInput: MachineClassFieldsInput,
  fm: SheetFrontMatter,
  number: number,
): AdaptContext {
  const material = materialFieldsSchema.parse(materialInput);
  const k = machineClassFieldsSchema.parse(classInput);
  const d = Number(cutter.diameterMm);
  const cornerForm = cutter.cornerForm ?? "square";
  return {
    versionId: "00000000-0000-4000-8000-000000000000",
    versionNumber: number,
    versionState: "published",
    sheetSlug: "demo",
    title: fm.title,
    cutter: {
      sku: cutter.sku,
      name: cutter.name,
      diameterMm: d,
      flutes: Number(cutter.flutes),
      cornerForm,
      cornerRadiusMm: cornerForm === "ball" ? d / 2 : cutter.cornerRadiusMm === undefined ? null : Number(cutter.cornerRadiusMm),
      fluteLengthMm: Number(cutter.fluteLengthMm),
      toolMaterial: cutter.toolMaterial ?? "carbide",
    },
    material: {
      name: material.name,
      vcMinMpm: material.vcMinMpm,
      vcMaxMpm: material.vcMaxMpm,
      minChipLoadMm: material.minChipLoadMm,
      kcNmm2: material.kcNmm2,
      chipLoadMinPctD: material.chipLoadMinPctD,
      chipLoadMaxPctD: material.chipLoadMaxPctD,
      kc11Nmm2: material.kc11Nmm2 ?? null,
      mc: material.mc ?? null,
      meltsWhenRubbing: material.cautions.some((c) => c.kind === "melting"),
    },
    referenceMachine: {
      name: k.name,
      rigidity: k.rigidity,
      rpmMin: k.rpmMin,
      rpmMax: k.rpmMax,
      maxFeedMmMin: k.maxFeedMmMin,
      zThrustN: k.zThrustN ?? null,
    },
    operations: fm.operations.map((op, i) => toContextOperation(op, i, d)),
    cautions: fm.cautions,
  };
}

/** The sheet's reference machine class as a customer's machine, with the cutter out of the collet by its flute length. */
export function referenceAsMachine(v: DemoVersion): BenchMachineInput {
  const k = machineClassFieldsSchema.parse(v.machineClass);
  return {
    minRpm: k.rpmMin,
    maxRpm: k.rpmMax,
    spindlePowerKw: k.powerKw,
    maxFeedMmMin: k.maxFeedMmMin,
    rigidity: k.rigidity,
    zThrustN: k.zThrustN,
    spindleKind: k.spindleKind,
    ratedRpm: k.ratedRpm,
    stickoutMm: Number(v.cutter.fluteLengthMm),
  };
}
