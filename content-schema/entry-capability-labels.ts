// How the customer's CAM enters the material, without the schema: browser code (the adapt panel's picker)
// imports these, and importing zod there would put all of zod in the panel's download.

export const ENTRY_CAPABILITY_KEYS = ["plunge-only", "ramp", "helix"] as const;
export type EntryCapabilityKey = (typeof ENTRY_CAPABILITY_KEYS)[number];

/** What the customer's CAM can do to get the cutter into the material, in the trade's words. */
export const entryCapabilityLabels: Record<EntryCapabilityKey, string> = {
  "plunge-only": "Straight plunge only",
  ramp: "Ramp in",
  helix: "Helix in (and ramp)",
};
