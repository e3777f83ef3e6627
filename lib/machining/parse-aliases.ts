// Unit spellings each parser accepts (lower case; matched longest first).
import { byLength } from "./parse-number";

export type LengthUnit = "mm" | "in";
export type FeedUnit = "mm/min" | "in/min";

export const LENGTH_ALIASES = byLength<LengthUnit | "cm">([
  ...["mm", "millimeter", "millimeters", "millimetre", "millimetres"].map((alias) => ({ alias, unit: "mm" as const })),
  { alias: "cm", unit: "cm" },
  ...["in", "in.", "inch", "inches", '"', "″", "”"].map((alias) => ({ alias, unit: "in" as const })),
]);

export const FEED_ALIASES = byLength<FeedUnit | "m/min">([
  { alias: "mm/min", unit: "mm/min" },
  { alias: "mmpm", unit: "mm/min" },
  { alias: "m/min", unit: "m/min" },
  { alias: "in/min", unit: "in/min" },
  { alias: "ipm", unit: "in/min" },
  { alias: '"/min', unit: "in/min" },
]);

export const SPEED_ALIASES = byLength<"rpm" | "krpm">([
  ...["rpm", "r/min", "min-1", "min⁻¹", "1/min"].map((alias) => ({ alias, unit: "rpm" as const })),
  ...["krpm", "k rpm", "k"].map((alias) => ({ alias, unit: "krpm" as const })),
]);

export const CHIP_ALIASES = byLength<LengthUnit>([
  ...["mm", "mm/tooth", "mm/t", "mm/z", "mm/th"].map((alias) => ({ alias, unit: "mm" as const })),
  ...["in", "in/tooth", "in/t", "ipt", '"', "″", "”"].map((alias) => ({ alias, unit: "in" as const })),
]);

export const CUTTING_SPEED_ALIASES = byLength<"m/min" | "sfm">([
  { alias: "m/min", unit: "m/min" },
  { alias: "sfm", unit: "sfm" },
  { alias: "ft/min", unit: "sfm" },
  { alias: "fpm", unit: "sfm" },
]);
