import type { Interval } from "./wilson";

// Pure: how a version fared against the one before it, judged by whether the failure intervals overlap.
export type VersionComparison = { verdict: "fewer_failures" | "more_failures" | "unclear" | "no_reports"; sentence: string };

const pct = (n: number) => `${(n * 100).toLocaleString("en-GB", { maximumFractionDigits: 0 })} %`;
const describe = (number: number, failed: number, outcomes: number, i: Interval) =>
  `version ${number} failed in ${failed} of ${outcomes} reports (${pct(i.lower)}–${pct(i.upper)})`;

export function compareVersions(
  previous: { number: number; failed: number; outcomes: number; failure: Interval },
  current: { number: number; failed: number; outcomes: number; failure: Interval },
  confidenceLabel: string,
): VersionComparison {
  if (previous.outcomes === 0 || current.outcomes === 0) {
    return {
      verdict: "no_reports",
      sentence: `No comparison yet: version ${previous.outcomes === 0 ? previous.number : current.number} has no outcome reports.`,
    };
  }
  const both = `${describe(current.number, current.failed, current.outcomes, current.failure)}; ${describe(previous.number, previous.failed, previous.outcomes, previous.failure)}`;
  const head = both.charAt(0).toUpperCase() + both.slice(1);
  if (current.failure.upper < previous.failure.lower)
    return { verdict: "fewer_failures", sentence: `${head}. Fewer failures: the ${confidenceLabel} intervals do not overlap.` };
  if (current.failure.lower > previous.failure.upper)
    return { verdict: "more_failures", sentence: `${head}. More failures: the ${confidenceLabel} intervals do not overlap.` };
  return { verdict: "unclear", sentence: `${head}. Not yet clear: the ${confidenceLabel} intervals overlap, so more reports are needed.` };
}
