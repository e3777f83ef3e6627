import { describe, expect, it } from "vitest";

import {
  COVERAGE_BANDS,
  findCoverageGaps,
  missesFor,
  type ClassSpec,
  type MachineGroup,
  type MachineSpec,
} from "@/lib/field/coverage-gaps";

// NOTE: the coverage bands (75–150 % top speed, minimum speed within 50 %, half to twice the power,
// rigidity ±0.2) are Swarfbook's own judgement, not a published standard. These tests pin the behaviour
// exactly at the band edges so that a change to the bands is a deliberate, visible decision.

/** The reference class every single-dimension test is measured against. */
const REFERENCE: MachineSpec = { rpmMin: 6000, rpmMax: 24000, powerKw: 2, rigidity: 0.55 };

const spec = (overrides: Partial<MachineSpec> = {}): MachineSpec => ({ ...REFERENCE, ...overrides });
const machine = (overrides: Partial<MachineGroup> = {}): MachineGroup => ({ ...REFERENCE, count: 1, ...overrides });
const klass = (overrides: Partial<ClassSpec> = {}): ClassSpec => ({ ...REFERENCE, slug: "router-24k", name: "24k router", ...overrides });

describe("COVERAGE_BANDS", () => {
  it("holds the documented (Swarfbook-chosen) bands", () => {
    expect(COVERAGE_BANDS).toEqual({ topSpeedRatio: [0.75, 1.5], lowSpeedRatioMax: 1.5, powerRatio: [0.5, 2], rigidityDelta: 0.2 });
  });
});

describe("missesFor: one dimension at a time", () => {
  it("a machine equal to the class is covered", () => {
    expect(missesFor(spec(), REFERENCE)).toEqual([]);
  });

  it("a machine comfortably inside every band is covered", () => {
    expect(missesFor(spec({ rpmMin: 8000, rpmMax: 30000, powerKw: 3, rigidity: 0.65 }), REFERENCE)).toEqual([]);
  });

  it.each<[string, Partial<MachineSpec>, ReturnType<typeof missesFor>]>([
    ["spindle top speed below 75 %", { rpmMax: 17999 }, [{ dimension: "spindle", direction: "below" }]],
    ["spindle top speed above 150 %", { rpmMax: 36001 }, [{ dimension: "spindle", direction: "above" }]],
    [
      "minimum speed more than 150 % of the class's (cannot turn slowly enough)",
      { rpmMin: 9001 },
      [{ dimension: "spindle", direction: "above" }],
    ],
    ["power below half", { powerKw: 0.99 }, [{ dimension: "power", direction: "below" }]],
    ["power above twice", { powerKw: 4.01 }, [{ dimension: "power", direction: "above" }]],
    ["rigidity more than 0.2 below", { rigidity: 0.34 }, [{ dimension: "rigidity", direction: "below" }]],
    ["rigidity more than 0.2 above", { rigidity: 0.76 }, [{ dimension: "rigidity", direction: "above" }]],
  ])("%s → the matching miss", (_label, overrides, expected) => {
    expect(missesFor(spec(overrides), REFERENCE)).toEqual(expected);
  });

  it("reports several misses together, in spindle, power, rigidity order", () => {
    expect(missesFor(spec({ rpmMax: 12000, powerKw: 0.5, rigidity: 1 }), REFERENCE)).toEqual([
      { dimension: "spindle", direction: "below" },
      { dimension: "power", direction: "below" },
      { dimension: "rigidity", direction: "above" },
    ]);
  });

  it("a top-speed miss is the only spindle miss: the minimum-speed check is not reported twice", () => {
    expect(missesFor(spec({ rpmMax: 12000, rpmMin: 20000 }), REFERENCE)).toEqual([{ dimension: "spindle", direction: "below" }]);
  });
});

describe("missesFor: exactly at the band edges (inclusive)", () => {
  it("top-speed ratio exactly 0.75 is covered; just below is not", () => {
    expect(18000 / 24000).toBe(0.75);
    expect(missesFor(spec({ rpmMax: 18000 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ rpmMax: 17999.9 }), REFERENCE)).toEqual([{ dimension: "spindle", direction: "below" }]);
  });

  it("top-speed ratio exactly 1.5 is covered; just above is not", () => {
    expect(missesFor(spec({ rpmMax: 36000 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ rpmMax: 36000.1 }), REFERENCE)).toEqual([{ dimension: "spindle", direction: "above" }]);
  });

  it("minimum speed exactly 1.5 × the class's is covered; just above is not", () => {
    expect(missesFor(spec({ rpmMin: 9000 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ rpmMin: 9000.1 }), REFERENCE)).toEqual([{ dimension: "spindle", direction: "above" }]);
    // a lower minimum speed than the class is always fine
    expect(missesFor(spec({ rpmMin: 100 }), REFERENCE)).toEqual([]);
  });

  it("power ratio exactly 0.5 and exactly 2 are covered", () => {
    expect(missesFor(spec({ powerKw: 1 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ powerKw: 4 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ powerKw: 0.999 }), REFERENCE)).toEqual([{ dimension: "power", direction: "below" }]);
    expect(missesFor(spec({ powerKw: 4.001 }), REFERENCE)).toEqual([{ dimension: "power", direction: "above" }]);
  });

  it("rigidity exactly ±0.2 away is covered despite floating-point dust (0.35 − 0.55 = −0.20000000000000004)", () => {
    expect(Math.abs(0.35 - 0.55)).toBeGreaterThan(0.2); // the dust the tolerance exists for
    expect(missesFor(spec({ rigidity: 0.35 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ rigidity: 0.75 }), REFERENCE)).toEqual([]);
    expect(missesFor(spec({ rigidity: 0.3499 }), REFERENCE)).toEqual([{ dimension: "rigidity", direction: "below" }]);
    expect(missesFor(spec({ rigidity: 0.7501 }), REFERENCE)).toEqual([{ dimension: "rigidity", direction: "above" }]);
  });
});

describe("findCoverageGaps", () => {
  it("a machine inside a class is covered and forms no cluster", () => {
    const report = findCoverageGaps([machine({ count: 4 })], [klass()]);
    expect(report).toEqual({ machines: 4, covered: 4, uncovered: 0, classes: 1, clusters: [] });
  });

  it("a machine is covered when any one class covers it, even if another misses", () => {
    const far = klass({ slug: "mill-8k", name: "8k mill", rpmMax: 8000, rpmMin: 500, powerKw: 7.5, rigidity: 1 });
    const report = findCoverageGaps([machine({ count: 3 })], [far, klass()]);
    expect(report.covered).toBe(3);
    expect(report.clusters).toEqual([]);
  });

  it("groups 31 small, slow machines into one cluster that no class covers", () => {
    const slow = (count: number, powerKw: number): MachineGroup => machine({ count, rpmMin: 6000, rpmMax: 12000, powerKw, rigidity: 0.35 });
    const report = findCoverageGaps([slow(20, 0.8), slow(8, 0.6), slow(3, 1)], [klass({ powerKw: 2.2 })]);
    expect(report.clusters).toHaveLength(1);
    const [cluster] = report.clusters;
    expect(cluster.machines).toBe(31);
    expect(cluster.summary.startsWith("31 machines with max 12,000 rpm")).toBe(true);
    // The power-band wording follows the module's band edges (which may be re-tuned), so only its shape is pinned.
    expect(cluster.summary).toMatch(/^31 machines with max 12,000 rpm, [^,:]+ kW and a light frame: no class covers them\. /);
    expect(cluster.summary).toContain("Nearest class: 24k router (top speed too low, less spindle power).");
    expect(cluster.rigidityLabel).toBe("a light frame");
    expect(cluster.rpmMax).toEqual({ min: 12000, median: 12000, max: 12000 });
    expect(cluster.powerKw).toEqual({ min: 0.6, median: 0.8, max: 1 });
    expect(cluster.nearestClass).toEqual({ slug: "router-24k", name: "24k router", rpmMax: 24000, powerKw: 2.2, rigidity: 0.55 });
    expect(cluster.misses).toEqual([
      { dimension: "spindle", direction: "below", machines: 31 },
      { dimension: "power", direction: "below", machines: 31 },
    ]);
  });

  it("a single uncovered machine is described in the singular", () => {
    const report = findCoverageGaps([machine({ rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 })], [klass()]);
    expect(report.clusters[0].summary).toMatch(/^1 machine with max 12,000 rpm, [^,:]+ kW and a light frame: no class covers it\./);
  });

  it("shows a top-speed range when the cluster's machines differ", () => {
    const report = findCoverageGaps(
      [machine({ rpmMax: 10500, powerKw: 0.75, rigidity: 0.35 }), machine({ rpmMax: 13000, powerKw: 0.75, rigidity: 0.35 })],
      [klass()],
    );
    expect(report.clusters).toHaveLength(1);
    expect(report.clusters[0].summary).toMatch(/^2 machines with max 10,500–13,000 rpm, /);
  });

  it("sorts clusters by machine count, biggest first", () => {
    const small = machine({ count: 3, rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 });
    const big = machine({ count: 17, rpmMax: 60000, rpmMin: 6000, powerKw: 0.4, rigidity: 0.35 });
    const medium = machine({ count: 9, rpmMax: 8000, rpmMin: 500, powerKw: 10, rigidity: 1 });
    const report = findCoverageGaps([small, big, medium], [klass()]);
    expect(report.clusters.map((c) => c.machines)).toEqual([17, 9, 3]);
  });

  it("machine, covered and uncovered counts add up (weighted by count)", () => {
    const machines = [
      machine({ count: 5 }), // covered
      machine({ count: 2, rpmMax: 30000 }), // covered
      machine({ count: 7, rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 }), // uncovered
      machine({ count: 4, rpmMax: 8000, rpmMin: 500, powerKw: 10, rigidity: 1 }), // uncovered
    ];
    const report = findCoverageGaps(machines, [klass(), klass({ slug: "router-30k", name: "30k router", rpmMax: 30000 })]);
    expect(report.machines).toBe(18);
    expect(report.covered).toBe(7);
    expect(report.uncovered).toBe(11);
    expect(report.classes).toBe(2);
    expect(report.covered + report.uncovered).toBe(report.machines);
    expect(report.clusters.reduce((s, c) => s + c.machines, 0)).toBe(report.uncovered);
  });

  it("with no classes every machine is uncovered and has no nearest class", () => {
    const report = findCoverageGaps([machine({ count: 3 }), machine({ count: 2, rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 })], []);
    expect(report).toMatchObject({ machines: 5, covered: 0, uncovered: 5, classes: 0 });
    expect(report.clusters).toHaveLength(2);
    for (const cluster of report.clusters) {
      expect(cluster.nearestClass).toBeNull();
      expect(cluster.misses).toEqual([]);
      expect(cluster.summary).toContain("The vendor publishes for no machine class yet.");
    }
  });

  it("an empty machine list gives an empty report", () => {
    expect(findCoverageGaps([], [klass()])).toEqual({ machines: 0, covered: 0, uncovered: 0, classes: 1, clusters: [] });
  });

  it("the median top speed and power are weighted by machine count", () => {
    // Same cluster (10–14k rpm top-speed band, the same power band at ≤ 1 kW, light frame): 1 machine at 10,500 rpm, 1 at 12,000, 10 at 13,000.
    // Unweighted, the median of the three values would be 12,000; weighted by count it is 13,000.
    const report = findCoverageGaps(
      [
        machine({ count: 1, rpmMax: 10500, powerKw: 0.6, rigidity: 0.35 }),
        machine({ count: 1, rpmMax: 12000, powerKw: 0.7, rigidity: 0.35 }),
        machine({ count: 10, rpmMax: 13000, powerKw: 0.9, rigidity: 0.35 }),
      ],
      [klass()],
    );
    expect(report.clusters).toHaveLength(1);
    expect(report.clusters[0].rpmMax).toEqual({ min: 10500, median: 13000, max: 13000 });
    expect(report.clusters[0].powerKw).toEqual({ min: 0.6, median: 0.9, max: 0.9 });
  });

  it("gives the median lowest speed and rigidity of a cluster, weighted by count, as the start of a new class", () => {
    const report = findCoverageGaps(
      [
        machine({ count: 1, rpmMin: 8000, rpmMax: 12000, powerKw: 0.6, rigidity: 0.3 }),
        machine({ count: 10, rpmMin: 6000, rpmMax: 12000, powerKw: 0.6, rigidity: 0.4 }),
      ],
      [klass()],
    );
    expect(report.clusters).toHaveLength(1);
    expect(report.clusters[0].rpmMinMedian).toBe(6000);
    expect(report.clusters[0].rigidityMedian).toBe(0.4);
  });

  it("the nearest class is the one with the fewest misses, and the cluster names the most common one", () => {
    const slowRouter = klass({ slug: "router-12k", name: "12k router", rpmMax: 12000, rpmMin: 6000, powerKw: 2.2, rigidity: 0.35 });
    // 12,000 rpm, 0.75 kW, light: misses slowRouter on power only; misses the 24k router on spindle and power.
    const report = findCoverageGaps([machine({ count: 6, rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 })], [klass(), slowRouter]);
    expect(report.clusters[0].nearestClass?.slug).toBe("router-12k");
    expect(report.clusters[0].misses).toEqual([{ dimension: "power", direction: "below", machines: 6 }]);
    expect(report.clusters[0].summary).toContain("Nearest class: 12k router (less spindle power).");
  });

  it("fewer misses beat a smaller distance when choosing the nearest class", () => {
    const m = machine({ count: 2, rpmMax: 24000, powerKw: 2, rigidity: 0.35 });
    // closeA is numerically closer (log-distance 0.80) but misses on spindle and rigidity;
    // oneMissB is farther (0.92) but misses on power only.
    const closeA = klass({ slug: "close-a", name: "Close A", rpmMax: 32500, rigidity: 0.6 });
    const oneMissB = klass({ slug: "one-miss-b", name: "One-miss B", powerKw: 0.8, rigidity: 0.35 });
    expect(missesFor(m, closeA)).toHaveLength(2);
    expect(missesFor(m, oneMissB)).toHaveLength(1);
    const report = findCoverageGaps([m], [closeA, oneMissB]);
    expect(report.clusters[0].nearestClass?.slug).toBe("one-miss-b");
    expect(report.clusters[0].misses).toEqual([{ dimension: "power", direction: "above", machines: 2 }]);
  });

  it("the cluster's nearest class is the one nearest to the most machines (weighted by count, not by group)", () => {
    const x = klass({ slug: "x-12k", name: "X 12k", rpmMax: 12000, powerKw: 2.2, rigidity: 0.35 });
    const y = klass({ slug: "y-13k", name: "Y 13k", rpmMax: 13000, powerKw: 2.2, rigidity: 0.35 });
    // One group of 10 machines nearest to X; two groups of 1 machine each nearest to Y; all in one cluster.
    const report = findCoverageGaps(
      [
        machine({ count: 10, rpmMax: 12000, powerKw: 0.75, rigidity: 0.35 }),
        machine({ count: 1, rpmMax: 13000, powerKw: 0.75, rigidity: 0.35 }),
        machine({ count: 1, rpmMax: 13000, powerKw: 0.7, rigidity: 0.35 }),
      ],
      [y, x],
    );
    expect(report.clusters).toHaveLength(1);
    expect(report.clusters[0].nearestClass?.slug).toBe("x-12k");
    expect(report.clusters[0].misses).toEqual([{ dimension: "power", direction: "below", machines: 12 }]);
  });
});
