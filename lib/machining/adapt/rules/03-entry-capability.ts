import { PLUNGE_ONLY_DEPTH_SHARE } from "../defaults";
import { say } from "../message-units";
import { change, warn, type AdaptState } from "../state";

/** Rule 3: with straight plunges only, in a material that melts, ap per pass ≤ D/4; a ramp or helix keeps the sheet's ap. */
export function entryCapability(s: AdaptState): void {
  if (s.input.entryCapability !== "plunge-only" || !s.input.meltsWhenRubbing) return;
  const limit = PLUNGE_ONLY_DEPTH_SHARE * s.input.operation.diameterMm;
  if (s.axialDepthMm <= limit) return;
  change(
    s,
    "entry-capability",
    "axialDepthMm",
    "length",
    limit,
    "Your CAM can only plunge straight down, and this material melts where the cutter dwells; passes no deeper than a quarter of the cutter diameter leave the hot entry point sooner and are the reliable start.",
  );
  warn(
    s,
    "plunge-only-shallow-passes",
    `With straight plunges only, cut this material in passes of at most ${say(s.input.units, limit, "length")}. A ramp or helical entry in your CAM would allow the vendor's depth.`,
    [{ name: "axialDepthMm", quantity: "length", value: limit }],
    "entryCapability",
  );
}
