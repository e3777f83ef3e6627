import type { CutterFields } from "@/content-schema/catalogue-cutter";
import type { MachineClassFields } from "@/content-schema/catalogue-machine-class";
import type { MaterialFields } from "@/content-schema/catalogue-material";
import type { CutterRow, MachineClassRow, MaterialRow } from "@/lib/db/tables";

import type { Cutter, MachineClass, Material } from "./catalogue-types";

const opt = <T>(v: T | null): T | undefined => v ?? undefined;
// Written through the material schema as a JSON array; anything else reads as no cautions.
const cautionsOf = (v: unknown): Material["cautions"] => (Array.isArray(v) ? v : []);

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

export const rowToCutter = (r: CutterRow): Cutter => ({
  id: r.id,
  sku: r.sku,
  name: r.name,
  diameterMm: r.diameter_mm,
  flutes: r.flutes,
  fluteLengthMm: r.flute_length_mm,
  overallLengthMm: r.overall_length_mm,
  shankMm: r.shank_mm,
  cornerForm: r.corner_form,
  cornerRadiusMm: opt(r.corner_radius_mm),
  helixDeg: opt(r.helix_deg),
  toolMaterial: r.tool_material,
  coating: opt(r.coating),
  geometry: r.geometry,
  notes: r.notes,
  shortCode: r.short_code,
  imageKey: r.image_key,
  updatedAt: r.updated_at,
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

export const rowToMaterial = (r: MaterialRow): Material => ({
  id: r.id,
  slug: r.slug,
  name: r.name,
  materialGroup: r.material_group,
  vcMinMpm: r.vc_min_mpm,
  vcMaxMpm: r.vc_max_mpm,
  minChipLoadMm: r.min_chip_load_mm,
  kcNmm2: r.kc_nmm2,
  chipLoadMinPctD: r.chip_load_min_pct_d,
  chipLoadMaxPctD: r.chip_load_max_pct_d,
  kc11Nmm2: opt(r.kc11_nmm2),
  mc: opt(r.mc),
  synonyms: r.synonyms ?? [],
  cautions: cautionsOf(r.cautions),
  notes: r.notes,
  updatedAt: r.updated_at,
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

export const rowToMachineClass = (r: MachineClassRow): MachineClass => ({
  id: r.id,
  slug: r.slug,
  name: r.name,
  description: r.description,
  rpmMin: r.rpm_min,
  rpmMax: r.rpm_max,
  powerKw: r.power_kw,
  maxFeedMmMin: r.max_feed_mm_min,
  rigidity: r.rigidity,
  zThrustN: opt(r.z_thrust_n),
  spindleKind: r.spindle_kind,
  ratedRpm: opt(r.rated_rpm),
  updatedAt: r.updated_at,
});
