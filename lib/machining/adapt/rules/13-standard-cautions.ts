import { warn, type AdaptState } from "../state";

function adaptedBeyondRuleOne(s: AdaptState): boolean {
  for (const step of s.steps) if (step.rule !== "reference-chip-load") return true;
  return false;
}

/** Rule 13: the cautions every adapted recipe carries. */
export function standardCautions(s: AdaptState): void {
  if (adaptedBeyondRuleOne(s)) {
    warn(
      s,
      "values-adapted",
      "These numbers were adapted from the vendor's tested values to your machine. Start with the feed override turned down and bring it up while you listen and watch the chips.",
    );
  }
  warn(
    s,
    "standard-cautions",
    "Starting values only: check workholding and tool clamping, wear eye and hearing protection, keep chips clear, and stay by the machine on the first cut.",
  );
}
