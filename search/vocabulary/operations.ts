import type { OperationKind } from "@/lib/machining/types";

import type { VocabularyEntry } from "./types";

/** Trade words for each operation kind; keys are the engine's and the sheet schema's kinds. */
export const operations: readonly VocabularyEntry<OperationKind>[] = [
  {
    key: "slotting",
    label: "slotting",
    terms: ["slotting", "slot", "slots", "full slot", "full width slot", "groove", "grooves", "grooving"],
  },
  { key: "pocket", label: "pocket clearing", terms: ["pocket", "pockets", "pocketing", "clearing", "pocket clearing", "area clearing"] },
  {
    key: "constant-engagement",
    label: "constant-engagement",
    terms: ["adaptive", "trochoidal", "HSM", "high speed machining", "HEM", "high efficiency milling", "constant engagement"],
    looseTerms: ["dynamic"],
  },
  { key: "profile", label: "profile", terms: ["profile", "profiling", "contour", "contouring", "cutout", "outline"] },
  { key: "finishing", label: "finishing", terms: ["finishing", "finish", "finish pass", "finishing pass", "spring pass"] },
  { key: "plunge", label: "plunge", terms: ["plunge", "plunging", "plunge cut"] },
  { key: "ramp", label: "ramp entry", terms: ["ramp", "ramping", "ramp entry"] },
  { key: "helical", label: "helical entry", terms: ["helical", "helical entry", "helical interpolation"], looseTerms: ["helix"] },
  { key: "drilling", label: "drilling", terms: ["drilling", "drill", "drills", "peck drilling"] },
];
