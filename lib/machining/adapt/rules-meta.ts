const GEOMETRY = "Milling geometry (Altintas, Manufacturing Automation, ch. 2)";
const SPEEDS = "ISO 3002-1 definitions; Machinery's Handbook, speeds and feeds";

/** The thirteen adaptation rules of lib/machining/README.md, in the order they run. */
export const RULES = [
  { id: "reference-chip-load", order: 1, title: "Reference chip load", source: `${SPEEDS}; ${GEOMETRY}; Kienzle (1952) for kc(hm)` },
  {
    id: "radial-chip-thinning",
    order: 2,
    title: "Engagement: chip thinning, slotting, depth override",
    source: `${GEOMETRY}; common practice (slotting factor 0.75, slot depth 0.7× the sheet's)`,
  },
  {
    id: "entry-capability",
    order: 3,
    title: "Entry capability",
    source: "Common practice (straight plunges in plastics that melt: passes under D/4)",
  },
  {
    id: "spindle-speed-range",
    order: 4,
    title: "Spindle speed range",
    source: `${SPEEDS}; ball nose effective diameter (Machinery's Handbook)`,
  },
  {
    id: "feed-limit",
    order: 5,
    title: "Feed limit and chip load floor",
    source: `${SPEEDS}; common practice (rubbing below the minimum chip load)`,
  },
  { id: "chip-load-band", order: 6, title: "Chip load band", source: "Common practice (chip load band per material as a share of D)" },
  { id: "cutting-speed-window", order: 7, title: "Cutting speed window", source: SPEEDS },
  { id: "rigidity", order: 8, title: "Machine rigidity", source: "Common practice (depth scaled by rigidity class)" },
  {
    id: "spindle-power",
    order: 9,
    title: "Spindle power at speed",
    source:
      "Machinery's Handbook, power section; Kienzle (1952) for kc(hm); constant torque below rated speed (electric drives, common practice)",
  },
  {
    id: "tool-deflection",
    order: 10,
    title: "Tool deflection",
    source:
      "Cantilever beam, δ = F·L³/(3·E·I) (Gere & Goodno, Mechanics of Materials); peak tooth force (Altintas ch. 2); 0.8·D effective diameter, rule of thumb",
  },
  {
    id: "plunge-feed",
    order: 11,
    title: "Plunge feed and Z thrust",
    source: "Common practice (vf = fn·n); thrust in the form of Machinery's Handbook's drilling thrust, coefficients calibrated",
  },
  { id: "sanity-limits", order: 12, title: "Sanity limits", source: "Common practice (flute length, stick-out, cutter size)" },
  { id: "standard-cautions", order: 13, title: "Standard cautions", source: "Common practice" },
] as const;

export type RuleId = (typeof RULES)[number]["id"];
export const RULE_IDS = RULES.map((r) => r.id) as RuleId[];

// A Map: every step looks its source up with a different id, which a keyed load on an object does slowly.
const SOURCES: ReadonlyMap<string, string> = new Map(RULES.map((r) => [r.id, r.source]));

export const ruleSource = (id: RuleId): string => SOURCES.get(id) ?? "";
