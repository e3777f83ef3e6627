/** Stable warning codes; UI and integrators key on these, so never rename one. */
export const WARNING_CODES = {
  "slotting-factor-applied": { rule: "radial-chip-thinning", title: "Full-width slot: feed and depth reduced" },
  "axial-depth-override-capped": { rule: "radial-chip-thinning", title: "Axial depth held at the sheet's" },
  "plunge-only-shallow-passes": { rule: "entry-capability", title: "Straight plunges only: shallow passes" },
  "chip-load-below-minimum": { rule: "feed-limit", title: "Chip load below the material's minimum" },
  "feed-capped": { rule: "feed-limit", title: "Feed capped at the machine's maximum" },
  "chip-load-above-maximum": { rule: "chip-load-band", title: "Chip load brought down to the band's ceiling" },
  "chip-load-band-impossible": { rule: "chip-load-band", title: "No chip load suits this cutter in this material" },
  "cutting-speed-below-window": { rule: "cutting-speed-window", title: "Cutting speed below the material's window" },
  "cutting-speed-above-window": { rule: "cutting-speed-window", title: "Cutting speed above the material's window" },
  "machine-too-small": { rule: "spindle-power", title: "Spindle too weak for this operation" },
  "power-limited-at-speed": { rule: "spindle-power", title: "Depth reduced: less spindle power at this speed" },
  "no-cutting-force-data": { rule: "spindle-power", title: "No specific cutting force for this material" },
  "deflection-above-limit": { rule: "tool-deflection", title: "Tool deflects more than the limit" },
  "no-stickout": { rule: "tool-deflection", title: "Stick-out unknown" },
  "plunge-thrust-limited": { rule: "plunge-feed", title: "Plunge feed held down by Z thrust" },
  "straight-plunge-refused": { rule: "plunge-feed", title: "Too much thrust to plunge straight: ramp or helix required" },
  "ramp-entry-recommended": { rule: "plunge-feed", title: "Ramp or helical entry recommended" },
  "stickout-below-flute-length": { rule: "sanity-limits", title: "Stick-out shorter than the flute length" },
  "standard-cautions": { rule: "standard-cautions", title: "Before the first cut" },
  "values-adapted": { rule: "standard-cautions", title: "Values differ from the vendor's test" },
} as const;

export type WarningCode = keyof typeof WARNING_CODES;
export const WARNING_CODE_LIST = Object.keys(WARNING_CODES) as WarningCode[];
