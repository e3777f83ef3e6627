const GEOMETRY = "Milling geometry (Altintas, Manufacturing Automation, ch. 2)";
const SPEEDS = "ISO 3002-1 definitions; Machinery's Handbook, speeds and feeds";

/** The ten adaptation rules of DOMAIN.md, in the order they run. */
export const RULES = [
  { id: "reference-chip-load", order: 1, title: "Reference chip load", source: `${SPEEDS}; ${GEOMETRY}` },
  { id: "radial-chip-thinning", order: 2, title: "Radial chip thinning", source: GEOMETRY },
  { id: "spindle-speed-range", order: 3, title: "Spindle speed range", source: SPEEDS },
  { id: "feed-limit", order: 4, title: "Feed limit and minimum chip load", source: `${SPEEDS}; common practice (rubbing below the minimum chip load)` },
  { id: "cutting-speed-window", order: 5, title: "Cutting speed window", source: SPEEDS },
  { id: "rigidity", order: 6, title: "Machine rigidity", source: "Common practice (depth scaled by rigidity class)" },
  { id: "spindle-power", order: 7, title: "Spindle power", source: "Machinery's Handbook, power section; Kienzle (1952) for kc" },
  { id: "tool-deflection", order: 8, title: "Tool deflection", source: "Cantilever beam, δ = F·L³/(3·E·I) (Gere & Goodno, Mechanics of Materials); 0.8·D effective diameter, rule of thumb" },
  { id: "plunge-feed", order: 9, title: "Plunge feed and Z thrust", source: "Common practice (vf = fn·n); drilling thrust approximation" },
  { id: "standard-cautions", order: 10, title: "Standard cautions", source: "Common practice" },
] as const;

export type RuleId = (typeof RULES)[number]["id"];
export const RULE_IDS = RULES.map((r) => r.id) as RuleId[];

const SOURCES = Object.fromEntries(RULES.map((r) => [r.id, r.source])) as Record<RuleId, string>;

export const ruleSource = (id: RuleId): string => SOURCES[id];
