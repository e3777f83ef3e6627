import { mmMinToInMin, type UnitSystem } from "@/lib/machining";

// Pure: the points the feed-vs-speed chart draws, across the machine's spindle range, in display units.

export type CurvePoint = { rpm: number; feed: number; rubbing: number };
export type FeedSpeedCurve = {
  points: CurvePoint[];
  /** Spindle speeds at which vc sits inside the material's window, clipped to the machine's range. */
  vcWindowRpm: [number, number] | null;
  maxFeed: number;
  adapted: { rpm: number; feed: number };
};

type Options = {
  machine: { minRpm: number; maxRpm: number; maxFeedMmMin: number };
  diameterMm: number;
  flutes: number;
  chipLoadMm: number;
  minChipLoadMm: number;
  vcWindowMpm: [number, number];
  adapted: { rpm: number; feedMmMin: number };
  units: UnitSystem;
  steps?: number;
};

export function feedSpeedCurve({
  machine,
  diameterMm,
  flutes,
  chipLoadMm,
  minChipLoadMm,
  vcWindowMpm,
  adapted,
  units,
  steps = 40,
}: Options): FeedSpeedCurve {
  const show = (mmMin: number) => (units === "imperial" ? mmMinToInMin(mmMin) : mmMin);
  const span = machine.maxRpm - machine.minRpm;
  const points = Array.from({ length: span > 0 ? steps + 1 : 1 }, (_, i) => {
    const rpm = machine.minRpm + (span * i) / steps;
    // vf = fz·z·n, held at the machine's feed limit; below fz_min·z·n the cutter rubs.
    return {
      rpm: Math.round(rpm),
      feed: show(Math.min(chipLoadMm * flutes * rpm, machine.maxFeedMmMin)),
      rubbing: show(minChipLoadMm * flutes * rpm),
    };
  });
  // n = 1000·vc / (π·D)
  const rpmAt = (vc: number) => (1000 * vc) / (Math.PI * diameterMm);
  const low = Math.max(machine.minRpm, rpmAt(vcWindowMpm[0]));
  const high = Math.min(machine.maxRpm, rpmAt(vcWindowMpm[1]));
  return {
    points,
    vcWindowRpm: low <= high ? [low, high] : null,
    maxFeed: show(machine.maxFeedMmMin),
    adapted: { rpm: adapted.rpm, feed: show(adapted.feedMmMin) },
  };
}
