// Ratios of one kind of work against a baseline measured in the same run (p50, p95, throughput).
import { percentile } from "./bench-args";
import type { KindResult } from "./bench-blocks";

export type Summary = { name: string; count: number; failures: number; p50: number; p95: number; perSecond: number };

export function summarize(r: KindResult): Summary {
  const count = r.latencies.length;
  return {
    name: r.name,
    count,
    failures: r.failures,
    p50: count ? percentile(r.latencies, 50) : NaN,
    p95: count ? percentile(r.latencies, 95) : NaN,
    perSecond: r.wallMs > 0 ? (count / r.wallMs) * 1000 : NaN,
  };
}

const ms = (n: number) => `${n.toFixed(1)} ms`;
const x = (n: number) => (Number.isFinite(n) ? n.toFixed(2) : "n/a");

/** Prints both kinds' figures and `<label> p95 ratio: X` lines; returns the ratios. */
export function reportRatio(label: string, subject: Summary, baseline: Summary, goal?: { p95?: number; throughput?: number }) {
  const p50 = subject.p50 / baseline.p50;
  const p95 = subject.p95 / baseline.p95;
  const throughput = subject.perSecond / baseline.perSecond;
  console.log(`\n${label}`);
  for (const s of [subject, baseline]) {
    console.log(
      `  ${s.name.padEnd(28)} ${String(s.count).padStart(6)} ok ${String(s.failures).padStart(4)} failed  p50 ${ms(s.p50).padStart(9)}  p95 ${ms(s.p95).padStart(9)}  ${s.perSecond.toFixed(0).padStart(6)}/s`,
    );
  }
  const verdict = (value: number, limit: number | undefined, atMost: boolean) =>
    limit === undefined ? "" : ` (goal ${atMost ? "≤" : "≥"} ${limit}: ${(atMost ? value <= limit : value >= limit) ? "met" : "not met"})`;
  console.log(`${label} p50 ratio: ${x(p50)}`);
  console.log(`${label} p95 ratio: ${x(p95)}${verdict(p95, goal?.p95, true)}`);
  console.log(`${label} throughput ratio: ${x(throughput)}${verdict(throughput, goal?.throughput, false)}`);
  return { p50, p95, throughput };
}
