import { count, positive } from "../validate";

// vc = π·D·n / 1000 (ISO 3002-1; Machinery's Handbook, speeds and feeds).

/** Cutting speed vc in m/min. */
export function cuttingSpeed({ diameterMm, rpm }: { diameterMm: number; rpm: number }): number {
  return (Math.PI * positive(diameterMm, "diameterMm") * positive(rpm, "rpm")) / 1000;
}

/** Spindle speed n in rpm for a cutting speed vc. */
export function spindleSpeed({ diameterMm, cuttingSpeedMpm }: { diameterMm: number; cuttingSpeedMpm: number }): number {
  return (1000 * positive(cuttingSpeedMpm, "cuttingSpeedMpm")) / (Math.PI * positive(diameterMm, "diameterMm"));
}

/** Feed rate vf = fz·z·n in mm/min. */
export function feedRate({ rpm, flutes, chipLoadMm }: { rpm: number; flutes: number; chipLoadMm: number }): number {
  return positive(chipLoadMm, "chipLoadMm") * count(flutes, "flutes") * positive(rpm, "rpm");
}

/** Chip load (feed per tooth) fz = vf / (z·n) in mm/tooth. */
export function chipLoad({ feedMmMin, rpm, flutes }: { feedMmMin: number; rpm: number; flutes: number }): number {
  return positive(feedMmMin, "feedMmMin") / (count(flutes, "flutes") * positive(rpm, "rpm"));
}

/** Plunge feed vf = fn·n in mm/min (fn in mm/rev). */
export function plungeFeed({ feedPerRevMm, rpm }: { feedPerRevMm: number; rpm: number }): number {
  return positive(feedPerRevMm, "feedPerRevMm") * positive(rpm, "rpm");
}
