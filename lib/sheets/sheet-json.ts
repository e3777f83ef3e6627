import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";

import type { SheetVersion } from "./sheet-types";

type Parts = {
  slug: string;
  version: SheetVersion;
  current: SheetVersion | null;
  history: SheetVersion[];
  cutter: Cutter;
  material: Material;
  machineClass: MachineClass;
};

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

/** The public JSON shape of one readable sheet version: structured data, metric values beside the text as written. */
export function sheetVersionJson({ slug, version, current, history, cutter, material, machineClass }: Parts) {
  const fm = version.frontMatter;
  return {
    slug,
    number: version.number,
    state: version.state,
    currentNumber: current?.number ?? null,
    title: version.title,
    summary: fm?.summary ?? "",
    changeNote: version.changeNote,
    publishedAt: iso(version.publishedAt),
    supersededAt: iso(version.supersededAt),
    withdrawnAt: iso(version.withdrawnAt),
    withdrawnReason: version.withdrawnReason,
    cutter: {
      sku: cutter.sku,
      name: cutter.name,
      DC_mm: cutter.diameterMm,
      ZEFP: cutter.flutes,
      APMX_mm: cutter.fluteLengthMm,
      OAL_mm: cutter.overallLengthMm,
      DMM_mm: cutter.shankMm,
      RE_mm: cutter.cornerRadiusMm ?? null,
      cornerForm: cutter.cornerForm,
      geometry: cutter.geometry,
      toolMaterial: cutter.toolMaterial,
      coating: cutter.coating ?? null,
    },
    material: {
      slug: material.slug,
      name: material.name,
      group: material.materialGroup,
      vcMinMpm: material.vcMinMpm,
      vcMaxMpm: material.vcMaxMpm,
      minChipLoadMm: material.minChipLoadMm,
      chipLoadBand: { minPctOfD: material.chipLoadMinPctD, maxPctOfD: material.chipLoadMaxPctD },
      kcNmm2: material.kcNmm2,
      kc11Nmm2: material.kc11Nmm2 ?? null,
      mc: material.mc ?? null,
      cautions: material.cautions,
    },
    machineClass: {
      slug: machineClass.slug,
      name: machineClass.name,
      rpmMin: machineClass.rpmMin,
      rpmMax: machineClass.rpmMax,
      powerKw: machineClass.powerKw,
      maxFeedMmMin: machineClass.maxFeedMmMin,
      rigidity: machineClass.rigidity,
      zThrustN: machineClass.zThrustN ?? null,
      spindleKind: machineClass.spindleKind,
      ratedRpm: machineClass.ratedRpm ?? null,
    },
    operations: fm?.operations ?? [],
    cautions: fm?.cautions ?? [],
    tags: fm?.tags ?? [],
    versions: history.map((v) => ({ number: v.number, state: v.state, publishedAt: iso(v.publishedAt), changeNote: v.changeNote })),
  };
}
