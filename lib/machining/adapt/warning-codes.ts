/** Stable warning codes; UI and integrators key on these, so never rename one. */
export const WARNING_CODES = {
  "chip-load-below-minimum": { rule: "feed-limit", title: "Chip load below the material's minimum" },
  "feed-capped": { rule: "feed-limit", title: "Feed capped at the machine's maximum" },
  "cutting-speed-below-window": { rule: "cutting-speed-window", title: "Cutting speed below the material's window" },
  "cutting-speed-above-window": { rule: "cutting-speed-window", title: "Cutting speed above the material's window" },
  "axial-depth-override-capped": { rule: "rigidity", title: "Axial depth held at the sheet's" },
  "machine-too-small": { rule: "spindle-power", title: "Spindle too weak for this operation" },
  "no-cutting-force-data": { rule: "spindle-power", title: "No specific cutting force for this material" },
  "deflection-above-limit": { rule: "tool-deflection", title: "Tool deflects more than the limit" },
  "no-stickout": { rule: "tool-deflection", title: "Stick-out unknown" },
  "plunge-thrust-limited": { rule: "plunge-feed", title: "Plunge feed held down by Z thrust" },
  "ramp-entry-recommended": { rule: "plunge-feed", title: "Ramp or helical entry recommended" },
  "standard-cautions": { rule: "standard-cautions", title: "Before the first cut" },
  "values-adapted": { rule: "standard-cautions", title: "Values differ from the vendor's test" },
} as const;

export type WarningCode = keyof typeof WARNING_CODES;
export const WARNING_CODE_LIST = Object.keys(WARNING_CODES) as WarningCode[];
