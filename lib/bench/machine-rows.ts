import type { SpindleKindKey } from "@/content-schema/spindle-kind";
import type { BenchMachineInput } from "@/lib/adapt/adapt-context";
import type { MachineRow } from "@/lib/db/tables";

/** A customer's machine in metric machining units. */
export type Machine = {
  id: string;
  name: string;
  preset: string | null;
  rpmMin: number;
  rpmMax: number;
  powerKw: number;
  maxFeedMmMin: number;
  rigidity: number;
  zThrustN: number | null;
  spindleKind: SpindleKindKey;
  /** null: the spindle holds torque up to its top speed. */
  ratedRpm: number | null;
  stickoutMm: number | null;
  units: "metric" | "imperial";
  updatedAt: string;
};

export const MACHINE_COLUMNS = [
  "id",
  "name",
  "preset",
  "rpm_min",
  "rpm_max",
  "power_kw",
  "max_feed_mm_min",
  "rigidity",
  "z_thrust_n",
  "spindle_kind",
  "rated_rpm",
  "stickout_mm",
  "units",
  "updated_at",
] as const satisfies readonly (keyof MachineRow)[];

export function rowToMachine(row: Pick<MachineRow, (typeof MACHINE_COLUMNS)[number]>): Machine {
  return {
    id: row.id,
    name: row.name,
    preset: row.preset,
    rpmMin: Number(row.rpm_min),
    rpmMax: Number(row.rpm_max),
    powerKw: Number(row.power_kw),
    maxFeedMmMin: Number(row.max_feed_mm_min),
    rigidity: Number(row.rigidity),
    zThrustN: row.z_thrust_n === null ? null : Number(row.z_thrust_n),
    spindleKind: row.spindle_kind,
    ratedRpm: row.rated_rpm === null ? null : Number(row.rated_rpm),
    stickoutMm: row.stickout_mm === null ? null : Number(row.stickout_mm),
    units: row.units,
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

/** The engine's machine input (and the usual stick-out) from a stored machine. */
export function machineToInput(
  m: Pick<Machine, "rpmMin" | "rpmMax" | "powerKw" | "maxFeedMmMin" | "rigidity" | "zThrustN" | "spindleKind" | "ratedRpm" | "stickoutMm">,
): BenchMachineInput {
  return {
    minRpm: m.rpmMin,
    maxRpm: m.rpmMax,
    spindlePowerKw: m.powerKw,
    maxFeedMmMin: m.maxFeedMmMin,
    rigidity: m.rigidity,
    zThrustN: m.zThrustN ?? undefined,
    spindleKind: m.spindleKind,
    ratedRpm: m.ratedRpm ?? undefined,
    stickoutMm: m.stickoutMm,
  };
}
