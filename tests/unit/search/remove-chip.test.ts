import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { describeQuery, looserQueries, parseQuery, removeChip } from "@/search/parse";

describe("removeChip", () => {
  it("removes one chip's words and keeps the rest", () => {
    const q = parseQuery("1/8 2F acrylic slot sign");
    const diameter = q.chips.find((c) => c.kind === "diameter")!;
    expect(removeChip(q.query, diameter)).toBe("2F acrylic slot sign");
    expect(removeChip("1 1/4 compression plywood", { kind: "diameter", value: "31.75" })).toBe("compression plywood");
  });

  it("removes every synonym that gave the same chip", () => {
    expect(removeChip("1/8 acrylic pmma slot", { kind: "material", value: "acrylic" })).toBe("1/8 slot");
  });

  it("returns the sanitised query when the chip is not in it", () => {
    expect(removeChip("  acrylic\tslot ", { kind: "material", value: "mdf" })).toBe("acrylic slot");
  });

  // At most one diameter and one flute count: a second, different one is text until the first goes.
  // No fragment pair forms a longer phrase when brought together (`aluminum` + `6061` would).
  const diameters = ["", "1/8", "6mm", "3.175 mm", "Ø6", ".25"];
  const flutes = ["", "2F", "3 flute", "single flute"];
  const words = [
    "acrylic",
    "PMMA",
    "cast acrylic",
    "aluminum",
    "HDPE",
    "mdf",
    "slot",
    "pocket",
    "profile",
    "ball nose",
    "upcut",
    "compression",
    "SB-1F-3175",
    "sign",
    "letters",
    "plastics",
  ];
  const query = fc
    .tuple(
      fc.constantFrom(...diameters),
      fc.constantFrom(...flutes),
      fc.uniqueArray(fc.constantFrom(...words), { minLength: 1, maxLength: 5 }),
    )
    .map(([d, f, w]) => [d, f, ...w].filter(Boolean))
    .chain((parts) => fc.shuffledSubarray(parts, { minLength: parts.length }));

  it("round trip: the query without a chip parses to the same chips less that one", () => {
    fc.assert(
      fc.property(query, (parts) => {
        const q = parseQuery(parts.join(" "));
        for (const chip of q.chips) {
          const after = parseQuery(removeChip(q.query, chip));
          const same = (c: { kind: string; value: string }) => c.kind === chip.kind && c.value === chip.value;
          expect(after.chips.map(({ kind, value }) => ({ kind, value }))).toEqual(
            q.chips.filter((c) => !same(c)).map(({ kind, value }) => ({ kind, value })),
          );
          expect(after.text).toBe(chip.kind === "sku" ? q.text.replace(chip.value.toLowerCase(), "").replace(/\s+/g, " ").trim() : q.text);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("looserQueries and describeQuery", () => {
  it("drops one part at a time and widens the material to its group", () => {
    expect(looserQueries(parseQuery("1/8 acrylic slot"))).toEqual(["acrylic slot", "1/8 acrylic", "1/8 plastics slot"]);
  });

  it("offers the recognised parts alone when free text is also present", () => {
    expect(looserQueries(parseQuery("acrylic sign letters"))).toEqual(["plastics sign letters", "acrylic"]);
  });

  it("has nothing to loosen in a query of unknown words", () => {
    expect(looserQueries(parseQuery("sign letters"))).toEqual([]);
  });

  it("describes the query with chip labels and the free text", () => {
    expect(describeQuery(parseQuery("1/8 PMMA slot sign"))).toBe('Ø 3.175\u00a0mm (1/8"), PMMA, slotting, “sign”');
    expect(describeQuery(parseQuery("SB-1F-3175"))).toBe("SB-1F-3175");
  });
});
