import type { SheetOperation } from "@/content-schema/sheet-front-matter";
import type { AdaptInput, CornerForm, EntryKind, SpindleKind, UnitSystem } from "@/lib/machining";

export type CutterRow = {
  diameter_mm: number;
  flutes: number;
  corner_form: string;
  corner_radius_mm: number | null;
  flute_length_mm: number | null;
  tool_material: "carbide" | "hss";
};
export type MaterialRow = {
  vc_min_mpm: number;
  vc_max_mpm: number;
  min_chip_load_mm: number;
  kc_nmm2: number;
  chip_load_min_pct_d: number;
  chip_load_max_pct_d: number;
  kc11_nmm2: number | null;
  mc: number | null;
  cautions: unknown;
};
export type MachineRow = {
  rpm_min: number;
  rpm_max: number;
  power_kw: number;
  max_feed_mm_min: number;
  rigidity: number;
  z_thrust_n: number | null;
  spindle_kind: SpindleKind;
  rated_rpm: number | null;
  stickout_mm: number | null;
  units?: UnitSystem;
};
export type MachineClassRow = { rigidity: number; rpm_max: number; max_feed_mm_min: number; z_thrust_n: number | null };

// One reader of stored front matter for the whole app (Bench owns it).
export { readStoredOperations as readOperations } from "@/lib/adapt/read-front-matter";

const ENGINE_ENTRY: Partial<Record<SheetOperation["entry"], EntryKind>> = { plunge: "plunge", ramp: "ramp", helical: "helix" };
const num = (v: number | null | undefined) => (v === null || v === undefined ? undefined : Number(v));
const melts = (cautions: unknown) => Array.isArray(cautions) && cautions.some((c) => (c as { kind?: unknown })?.kind === "melting");

/** The engine input for one operation of a sheet on a customer's machine (metric units throughout). */
export function toAdaptInput(
  op: SheetOperation,
  cutter: CutterRow,
  material: MaterialRow,
  reference: MachineClassRow,
  machine: MachineRow,
): AdaptInput {
  const d = Number(cutter.diameter_mm);
  return {
    operation: {
      kind: op.kind,
      diameterMm: d,
      flutes: cutter.flutes,
      rpm: op.n.value,
      feedMmMin: op.vf.value,
      axialDepthMm: op.ap.value,
      radialDepthMm: op.ae.unit === "%D" ? (op.ae.value / 100) * d : op.ae.value,
      plungeFeedMmMin: op.plungeFeed?.value,
      cornerRadiusMm: cutter.corner_form === "ball" ? d / 2 : num(cutter.corner_radius_mm),
      cornerForm: cutter.corner_form as CornerForm,
      fluteLengthMm: num(cutter.flute_length_mm),
      entry: ENGINE_ENTRY[op.entry],
      rampAngleDeg: op.rampAngleDeg,
    },
    material: {
      cuttingSpeedWindowMpm: [Number(material.vc_min_mpm), Number(material.vc_max_mpm)],
      minChipLoadMm: Number(material.min_chip_load_mm),
      specificCuttingForceNmm2: Number(material.kc_nmm2),
      chipLoadPctOfD: { min: Number(material.chip_load_min_pct_d) / 100, max: Number(material.chip_load_max_pct_d) / 100 },
      kc11Nmm2: num(material.kc11_nmm2),
      mc: num(material.mc),
      meltsWhenRubbing: melts(material.cautions),
    },
    referenceMachine: {
      rigidity: Number(reference.rigidity),
      maxRpm: Number(reference.rpm_max),
      maxFeedMmMin: Number(reference.max_feed_mm_min),
      zThrustN: num(reference.z_thrust_n),
    },
    machine: {
      minRpm: Number(machine.rpm_min),
      maxRpm: Number(machine.rpm_max),
      maxFeedMmMin: Number(machine.max_feed_mm_min),
      spindlePowerKw: Number(machine.power_kw),
      rigidity: Number(machine.rigidity),
      zThrustN: num(machine.z_thrust_n),
      spindleKind: machine.spindle_kind,
      ratedRpm: num(machine.rated_rpm),
    },
    overrides: { stickoutMm: num(machine.stickout_mm) },
    options: { toolMaterial: cutter.tool_material, messageUnits: machine.units },
  };
}
