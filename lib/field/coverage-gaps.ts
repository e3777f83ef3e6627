import { rigidityClassOf } from "@/content-schema/machine-rigidity";

// Pure: which customers' machines no published machine class covers, grouped so an engineer can act.
// A class "covers" a machine when the machine is near enough to the class's reference machine that the
// class's numbers are a fair starting point. The bands are Swarfbook's own judgement, kept here as data.
export const COVERAGE_BANDS = {
  /** The machine's top speed from 75 % to 150 % of the class's top speed. */
  topSpeedRatio: [0.75, 1.5],
  /** …and it can turn as slowly as the class assumes, within 50 %. */
  lowSpeedRatioMax: 1.5,
  /** Spindle power from half to twice the class's. */
  powerRatio: [0.5, 2],
  /** Rigidity factor (0–1) within ±0.2 of the class's. */
  rigidityDelta: 0.2,
} as const;

export type Dimension = "spindle" | "power" | "rigidity";
export type Miss = { dimension: Dimension; direction: "below" | "above" };

export type MachineSpec = { rpmMin: number; rpmMax: number; powerKw: number; rigidity: number };
export type MachineGroup = MachineSpec & { count: number };
export type ClassSpec = MachineSpec & { slug: string; name: string };

export type CoverageCluster = {
  key: string;
  machines: number;
  rpmMax: { min: number; median: number; max: number };
  powerKw: { min: number; median: number; max: number };
  /** Medians (by machine count) of the lowest speed and the rigidity: a starting point for a new class. */
  rpmMinMedian: number;
  rigidityMedian: number;
  rigidityLabel: string;
  nearestClass: { slug: string; name: string; rpmMax: number; powerKw: number; rigidity: number } | null;
  /** Per dimension: how many of the cluster's machines miss the nearest class there, and which way. */
  misses: { dimension: Dimension; direction: "below" | "above"; machines: number }[];
  summary: string;
};

export type CoverageReport = { machines: number; covered: number; uncovered: number; classes: number; clusters: CoverageCluster[] };

export function missesFor(m: MachineSpec, c: MachineSpec): Miss[] {
  const misses: Miss[] = [];
  const top = m.rpmMax / c.rpmMax;
  if (top < COVERAGE_BANDS.topSpeedRatio[0]) misses.push({ dimension: "spindle", direction: "below" });
  else if (top > COVERAGE_BANDS.topSpeedRatio[1]) misses.push({ dimension: "spindle", direction: "above" });
  else if (m.rpmMin > c.rpmMin * COVERAGE_BANDS.lowSpeedRatioMax) misses.push({ dimension: "spindle", direction: "above" });
  const power = m.powerKw / c.powerKw;
  if (power < COVERAGE_BANDS.powerRatio[0]) misses.push({ dimension: "power", direction: "below" });
  else if (power > COVERAGE_BANDS.powerRatio[1]) misses.push({ dimension: "power", direction: "above" });
  const stiffness = m.rigidity - c.rigidity;
  if (Math.abs(stiffness) > COVERAGE_BANDS.rigidityDelta + 1e-9)
    misses.push({ dimension: "rigidity", direction: stiffness < 0 ? "below" : "above" });
  return misses;
}

const distance = (m: MachineSpec, c: MachineSpec) =>
  Math.abs(Math.log(m.rpmMax / c.rpmMax)) + Math.abs(Math.log(m.powerKw / c.powerKw)) + 2 * Math.abs(m.rigidity - c.rigidity);

function nearest(m: MachineSpec, classes: readonly ClassSpec[]) {
  let best: { klass: ClassSpec; misses: Miss[]; score: number } | null = null;
  for (const klass of classes) {
    const misses = missesFor(m, klass);
    const score = misses.length * 100 + distance(m, klass);
    if (!best || score < best.score) best = { klass, misses, score };
  }
  return best;
}

const RPM_EDGES = [10_000, 14_000, 18_000, 24_000, 30_000];
const POWER_EDGES = [1, 3, 6];
function bandOf(value: number, edges: readonly number[]): number {
  const band = edges.findIndex((edge) => value <= edge + 1e-9);
  return band === -1 ? edges.length : band;
}

function powerBandLabel(band: number): string {
  if (band === 0) return `up to ${POWER_EDGES[0]} kW`;
  if (band === POWER_EDGES.length) return `over ${POWER_EDGES[POWER_EDGES.length - 1]} kW`;
  return `${POWER_EDGES[band - 1]}–${POWER_EDGES[band]} kW`;
}

const RIGIDITY_WORDS: Record<string, string> = {
  light: "a light frame",
  moderate: "a moderately stiff frame",
  stiff: "a stiff frame",
  "very-rigid": "a very rigid frame",
};
const DIRECTION_WORDS: Record<Dimension, Record<"below" | "above", string>> = {
  spindle: { below: "top speed too low", above: "spindle faster or with a higher minimum speed" },
  power: { below: "less spindle power", above: "much more spindle power" },
  rigidity: { below: "less rigid", above: "much more rigid" },
};

const fmt = (n: number, digits = 0) => n.toLocaleString("en-GB", { maximumFractionDigits: digits });

function weightedMedian(values: { value: number; count: number }[]): number {
  const sorted = [...values].sort((a, b) => a.value - b.value);
  const total = sorted.reduce((s, v) => s + v.count, 0);
  let seen = 0;
  for (const v of sorted) {
    seen += v.count;
    if (seen * 2 >= total) return v.value;
  }
  return sorted[sorted.length - 1]?.value ?? 0;
}

function rangeOf(values: { value: number; count: number }[]) {
  return { min: Math.min(...values.map((v) => v.value)), median: weightedMedian(values), max: Math.max(...values.map((v) => v.value)) };
}

/** Groups the machines that no class covers by top speed, power and rigidity; biggest clusters first. */
export function findCoverageGaps(machines: readonly MachineGroup[], classes: readonly ClassSpec[]): CoverageReport {
  const total = machines.reduce((s, m) => s + m.count, 0);
  const clusters = new Map<
    string,
    { groups: (MachineGroup & { near: ReturnType<typeof nearest> })[]; rpmBand: number; powerBand: number; rigidityKey: string }
  >();
  let covered = 0;
  for (const m of machines) {
    const near = nearest(m, classes);
    if (near && near.misses.length === 0) {
      covered += m.count;
      continue;
    }
    const rpmBand = bandOf(m.rpmMax, RPM_EDGES),
      powerBand = bandOf(m.powerKw, POWER_EDGES),
      rigidityKey = rigidityClassOf(m.rigidity).key;
    const key = `${rpmBand}:${powerBand}:${rigidityKey}`;
    const cluster = clusters.get(key) ?? { groups: [], rpmBand, powerBand, rigidityKey };
    cluster.groups.push({ ...m, near });
    clusters.set(key, cluster);
  }
  const result: CoverageCluster[] = [...clusters.entries()].map(([key, c]) => {
    const count = c.groups.reduce((s, g) => s + g.count, 0);
    const rpmMax = rangeOf(c.groups.map((g) => ({ value: g.rpmMax, count: g.count })));
    const powerKw = rangeOf(c.groups.map((g) => ({ value: g.powerKw, count: g.count })));
    const nearCounts = new Map<string, { klass: ClassSpec; count: number }>();
    const missCounts = new Map<string, { dimension: Dimension; direction: "below" | "above"; machines: number }>();
    for (const g of c.groups) {
      if (!g.near) continue;
      const entry = nearCounts.get(g.near.klass.slug) ?? { klass: g.near.klass, count: 0 };
      entry.count += g.count;
      nearCounts.set(g.near.klass.slug, entry);
      for (const miss of g.near.misses) {
        const id = `${miss.dimension}:${miss.direction}`;
        const m = missCounts.get(id) ?? { ...miss, machines: 0 };
        m.machines += g.count;
        missCounts.set(id, m);
      }
    }
    const top = [...nearCounts.values()].sort((a, b) => b.count - a.count)[0]?.klass ?? null;
    const misses = [...missCounts.values()].sort((a, b) => b.machines - a.machines);
    const speed = rpmMax.min === rpmMax.max ? `max ${fmt(rpmMax.median)} rpm` : `max ${fmt(rpmMax.min)}–${fmt(rpmMax.max)} rpm`;
    const why = top
      ? ` Nearest class: ${top.name} (${misses.map((m) => DIRECTION_WORDS[m.dimension][m.direction]).join(", ")}).`
      : " The vendor publishes for no machine class yet.";
    return {
      key,
      machines: count,
      rpmMax,
      powerKw,
      rpmMinMedian: weightedMedian(c.groups.map((g) => ({ value: g.rpmMin, count: g.count }))),
      rigidityMedian: weightedMedian(c.groups.map((g) => ({ value: g.rigidity, count: g.count }))),
      rigidityLabel: RIGIDITY_WORDS[c.rigidityKey],
      nearestClass: top && { slug: top.slug, name: top.name, rpmMax: top.rpmMax, powerKw: top.powerKw, rigidity: top.rigidity },
      misses,
      summary: `${fmt(count)} ${count === 1 ? "machine" : "machines"} with ${speed}, ${powerBandLabel(c.powerBand)} and ${RIGIDITY_WORDS[c.rigidityKey]}: no class covers ${count === 1 ? "it" : "them"}.${why}`,
    };
  });
  result.sort((a, b) => b.machines - a.machines || a.key.localeCompare(b.key));
  return { machines: total, covered, uncovered: total - covered, classes: classes.length, clusters: result };
}
