import { rigidityClassOf } from "@/content-schema/machine-rigidity";
import type { Machine } from "@/lib/bench/machine-rows";

import type { MachineFormValues } from "./machine-form";

export const EMPTY_MACHINE_VALUES: MachineFormValues = {
  name: "",
  preset: "",
  rpmMin: "",
  rpmMax: "",
  powerKw: "",
  maxFeedMmMin: "",
  rigidity: "moderate",
  zThrustN: "",
  spindleKind: "constant-torque",
  ratedRpm: "",
  stickoutMm: "",
  units: "metric",
};

/** A stored machine as form text (metric, with units written out). */
export const machineToValues = (m: Machine): MachineFormValues => ({
  name: m.name,
  preset: m.preset ?? "",
  rpmMin: String(m.rpmMin),
  rpmMax: String(m.rpmMax),
  powerKw: String(m.powerKw),
  maxFeedMmMin: `${m.maxFeedMmMin} mm/min`,
  rigidity: rigidityClassOf(m.rigidity).key,
  zThrustN: m.zThrustN === null ? "" : String(m.zThrustN),
  spindleKind: m.spindleKind,
  ratedRpm: m.ratedRpm === null ? "" : String(m.ratedRpm),
  stickoutMm: m.stickoutMm === null ? "" : `${Number(m.stickoutMm.toFixed(3))} mm`,
  units: m.units,
});
