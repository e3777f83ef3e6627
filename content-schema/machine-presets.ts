import type { RigidityKey } from "./machine-rigidity";
import type { SpindleKindKey } from "./spindle-kind";

/**
 * Start-from values for common machine categories; invented round numbers, to be corrected by the owner.
 * A trim router's universal motor is taken as roughly constant power; water-cooled router spindles run on a
 * VFD and hold torque below their rated speed (common practice, from memory).
 */
export type MachinePreset = {
  key: string;
  label: string;
  rpmMin: number;
  rpmMax: number;
  powerKw: number;
  maxFeedMmMin: number;
  rigidity: RigidityKey;
  zThrustN?: number;
  spindleKind: SpindleKindKey;
  /** Where the spindle reaches its rated power; absent: its top speed. */
  ratedRpm?: number;
  stickoutMm: number;
};

export const MACHINE_PRESETS: MachinePreset[] = [
  {
    key: "light-trim-router",
    label: "Light belt-drive router with a trim-router spindle",
    rpmMin: 10000,
    rpmMax: 30000,
    powerKw: 0.6,
    maxFeedMmMin: 2500,
    rigidity: "light",
    zThrustN: 150,
    spindleKind: "constant-power",
    stickoutMm: 18,
  },
  {
    key: "hobby-water-cooled",
    label: "Hobby router with a small water-cooled spindle",
    rpmMin: 6000,
    rpmMax: 24000,
    powerKw: 0.8,
    maxFeedMmMin: 3000,
    rigidity: "moderate",
    zThrustN: 250,
    spindleKind: "constant-torque",
    ratedRpm: 24000,
    stickoutMm: 18,
  },
  {
    key: "rigid-ball-screw",
    label: "Rigid ball-screw router with 2.2 kW spindle",
    rpmMin: 6000,
    rpmMax: 24000,
    powerKw: 2.2,
    maxFeedMmMin: 10000,
    rigidity: "stiff",
    zThrustN: 600,
    spindleKind: "constant-torque",
    ratedRpm: 24000,
    stickoutMm: 20,
  },
  {
    key: "production-router",
    label: "Production panel router with a large spindle",
    rpmMin: 6000,
    rpmMax: 24000,
    powerKw: 9,
    maxFeedMmMin: 30000,
    rigidity: "very-rigid",
    zThrustN: 2000,
    spindleKind: "constant-torque",
    ratedRpm: 18000,
    stickoutMm: 25,
  },
  {
    key: "small-machining-centre",
    label: "Small machining centre",
    rpmMin: 500,
    rpmMax: 12000,
    powerKw: 5.5,
    maxFeedMmMin: 15000,
    rigidity: "very-rigid",
    zThrustN: 5000,
    spindleKind: "constant-power",
    stickoutMm: 30,
  },
];

export const presetByKey = (key: string | undefined) => MACHINE_PRESETS.find((p) => p.key === key);
