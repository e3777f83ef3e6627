import { OUTCOME_SYMPTOMS } from "@/content-schema/outcome-fields";
import { toCsv } from "@/lib/csv/to-csv";

import type { CoverageReport } from "./coverage-gaps";
import type { ChangeItem } from "./customer-changes";
import { describeChange } from "./describe-change";
import type { AttentionItem } from "./needs-attention";
import type { VersionRollup } from "./rollup-rows";
import type { TrendWeek } from "./week-series";

// Pure: each Field-results list as CSV. Shares as fractions with 4 decimals, so a spreadsheet can compute with them.
const share = (n: number) => n.toFixed(4);

export function needsAttentionCsv(items: AttentionItem[], confidence: number): string {
  return toCsv([
    [
      "rank",
      "sheet",
      "title",
      "machine_class",
      "version",
      "reports",
      "failed",
      "failure_share",
      `wilson_lower_${confidence}`,
      `wilson_upper_${confidence}`,
      ...OUTCOME_SYMPTOMS,
      "tickets",
      "open_handoffs",
    ],
    ...items.map((a, i) => [
      i + 1,
      a.sheetSlug,
      a.title,
      a.machineClass,
      a.number,
      a.outcomes,
      a.failed,
      share(a.failure.share),
      share(a.failure.lower),
      share(a.failure.upper),
      ...OUTCOME_SYMPTOMS.map((s) => a.symptoms[s]),
      a.tickets,
      a.openHandoffs,
    ]),
  ]);
}

export function customerChangesCsv(items: ChangeItem[]): string {
  return toCsv([
    [
      "sheet",
      "title",
      "machine_class",
      "version",
      "operation",
      "parameter",
      "reports",
      "median_change_pct",
      "q1_change_pct",
      "q3_change_pct",
      "lowered",
      "raised",
      "summary",
    ],
    ...items.map((c) => [
      c.sheetSlug,
      c.title,
      c.machineClass,
      c.number,
      c.operationLabel,
      c.param,
      c.reports,
      c.medianPct.toFixed(1),
      c.q1Pct.toFixed(1),
      c.q3Pct.toFixed(1),
      c.lowered,
      c.raised,
      describeChange(c),
    ]),
  ]);
}

export function coverageGapsCsv(report: CoverageReport): string {
  return toCsv([
    [
      "machines",
      "rpm_max_min",
      "rpm_max_median",
      "rpm_max_max",
      "power_kw_min",
      "power_kw_median",
      "power_kw_max",
      "frame",
      "nearest_class",
      "misses",
      "summary",
    ],
    ...report.clusters.map((c) => [
      c.machines,
      c.rpmMax.min,
      c.rpmMax.median,
      c.rpmMax.max,
      c.powerKw.min,
      c.powerKw.median,
      c.powerKw.max,
      c.rigidityLabel,
      c.nearestClass?.slug ?? "",
      c.misses.map((m) => `${m.dimension} ${m.direction} (${m.machines})`).join("; "),
      c.summary,
    ]),
  ]);
}

export function sheetVersionsCsv(sheetSlug: string, versions: VersionRollup[], confidence: number): string {
  return toCsv([
    [
      "sheet",
      "version",
      "state",
      "views",
      "adaptations",
      "setups",
      "reports",
      "worked_as_written",
      "worked_after_changes",
      "failed",
      ...OUTCOME_SYMPTOMS.map((s) => `failed_${s}`),
      `wilson_lower_${confidence}`,
      `wilson_upper_${confidence}`,
      "tickets",
      "handoffs",
    ],
    ...versions.map((v) => [
      sheetSlug,
      v.number,
      v.state,
      v.views,
      v.adaptations,
      v.setups,
      v.outcomes,
      v.workedAsWritten,
      v.workedAfterChanges,
      v.failed,
      ...OUTCOME_SYMPTOMS.map((s) => v.symptoms[s]),
      share(v.failure.lower),
      share(v.failure.upper),
      v.tickets,
      v.handoffs,
    ]),
  ]);
}

/** One row per week of the range (weeks without reports as zeros), with the versions published that week. */
export function sheetTrendsCsv(sheetSlug: string, weeks: TrendWeek[], confidence: number): string {
  return toCsv([
    [
      "sheet",
      "week_start",
      "reports",
      "failed",
      "failure_share",
      `wilson_lower_${confidence}`,
      `wilson_upper_${confidence}`,
      "published_versions",
    ],
    ...weeks.map((w) => [
      sheetSlug,
      w.week,
      w.outcomes,
      w.failed,
      w.outcomes ? share(w.failure.share) : "",
      w.outcomes ? share(w.failure.lower) : "",
      w.outcomes ? share(w.failure.upper) : "",
      w.published.join(" "),
    ]),
  ]);
}
