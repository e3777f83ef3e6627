import type { CutterFields } from "@/content-schema/catalogue-cutter";
import type { MachineClassFields } from "@/content-schema/catalogue-machine-class";
import type { MaterialFields } from "@/content-schema/catalogue-material";

import type { Cutter, MachineClass, Material } from "./catalogue-types";

type Row = Record<string, unknown>;
const opt = (v: unknown) => (v === null || v === undefined ? undefined : (v as never));

export const cutterToRow = (c: CutterFields) => ({
  sku: c.sku,
  name: c.name,
  diameter_mm: c.diameterMm,
  flutes: c.flutes,
  flute_length_mm: c.fluteLengthMm,
  overall_length_mm: c.overallLengthMm,
  shank_mm: c.shankMm,
  corner_form: c.cornerForm,
  corner_radius_mm: c.cornerRadiusMm ?? null,
  helix_deg: c.helixDeg ?? null,
  tool_material: c.toolMaterial,
  coating: c.coating ?? null,
  geometry: c.geometry,
  notes: c.notes,
});

export const rowToCutter = (r: Row): Cutter => ({
  id: r.id as string,
  sku: r.sku as string,
  name: r.name as string,
  diameterMm: r.diameter_mm as number,
  flutes: r.flutes as number,
  fluteLengthMm: r.flute_length_mm as number,
  overallLengthMm: r.overall_length_mm as number,
  shankMm: r.shank_mm as number,
  cornerForm: r.corner_form as Cutter["cornerForm"],
  cornerRadiusMm: opt(r.corner_radius_mm),
  helixDeg: opt(r.helix_deg),
  toolMaterial: r.tool_material as Cutter["toolMaterial"],
  coating: opt(r.coating),
  geometry: r.geometry as Cutter["geometry"],
  notes: r.notes as string,
  shortCode: r.short_code as string,
  imageKey: (r.image_key as string | null) ?? null,
  updatedAt: r.updated_at as Date,
});

export const materialToRow = (m: MaterialFields) => ({
  slug: m.slug,
  name: m.name,
  material_group: m.materialGroup,
  vc_min_mpm: m.vcMinMpm,
  vc_max_mpm: m.vcMaxMpm,
  min_chip_load_mm: m.minChipLoadMm,
  kc_nmm2: m.kcNmm2,
  chip_load_min_pct_d: m.chipLoadMinPctD,
  chip_load_max_pct_d: m.chipLoadMaxPctD,
  kc11_nmm2: m.kc11Nmm2 ?? null,
  mc: m.mc ?? null,
  synonyms: m.synonyms,
  cautions: JSON.stringify(m.cautions),
  notes: m.notes,
});

export const rowToMaterial = (r: Row): Material => ({
  id: r.id as string,
  slug: r.slug as string,
  name: r.name as string,
  materialGroup: r.material_group as Material["materialGroup"],
  vcMinMpm: r.vc_min_mpm as number,
  vcMaxMpm: r.vc_max_mpm as number,
  minChipLoadMm: r.min_chip_load_mm as number,
  kcNmm2: r.kc_nmm2 as number,
  chipLoadMinPctD: r.chip_load_min_pct_d as number,
  chipLoadMaxPctD: r.chip_load_max_pct_d as number,
  kc11Nmm2: opt(r.kc11_nmm2),
  mc: opt(r.mc),
  synonyms: (r.synonyms as string[]) ?? [],
  cautions: (r.cautions as Material["cautions"]) ?? [],
  notes: r.notes as string,
  updatedAt: r.updated_at as Date,
});

export const machineClassToRow = (k: MachineClassFields) => ({
  slug: k.slug,
  name: k.name,
  description: k.description,
  rpm_min: k.rpmMin,
  rpm_max: k.rpmMax,
  power_kw: k.powerKw,
  max_feed_mm_min: k.maxFeedMmMin,
  rigidity: k.rigidity,
  z_thrust_n: k.zThrustN ?? null,
  spindle_kind: k.spindleKind,
  rated_rpm: k.ratedRpm ?? null,
});

export const rowToMachineClass = (r: Row): MachineClass => ({
  id: r.id as string,
  slug: r.slug as string,
  name: r.name as string,
  description: r.description as string,
  rpmMin: r.rpm_min as number,
  rpmMax: r.rpm_max as number,
  powerKw: r.power_kw as number,
  maxFeedMmMin: r.max_feed_mm_min as number,
  rigidity: r.rigidity as number,
  zThrustN: opt(r.z_thrust_n),
  spindleKind: r.spindle_kind as MachineClass["spindleKind"],
  ratedRpm: opt(r.rated_rpm),
  updatedAt: r.updated_at as Date,
});
