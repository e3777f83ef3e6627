import { describe, expect, it } from "vitest";

import { OPERATION_KINDS } from "@/lib/machining/types";
import { classifyMaterial } from "@/search/parse";
import {
  CORNER_FORMS,
  cornerForms,
  CUTTER_GEOMETRIES,
  geometries,
  MATERIAL_GROUPS,
  materialByKey,
  materialKeysWithin,
  materials,
  oneWaySynonyms,
  operations,
  synonymGroups,
  termKey,
  vocabularyEntries,
} from "@/search/vocabulary";

describe("search vocabulary", () => {
  it("gives every spelling to exactly one thing", () => {
    const owners = new Map<string, string>();
    for (const entry of vocabularyEntries) {
      for (const term of [...entry.terms, ...(entry.looseTerms ?? [])]) {
        const key = termKey(term);
        expect(owners.get(key), `${term} in ${entry.key} and ${owners.get(key)}`).toBeUndefined();
        owners.set(key, entry.key);
      }
    }
  });

  it("covers every operation kind, corner form and geometry, and nothing else", () => {
    expect(operations.map((o) => o.key).sort()).toEqual([...OPERATION_KINDS].sort());
    expect(cornerForms.map((c) => c.key).sort()).toEqual([...CORNER_FORMS].sort());
    expect(geometries.map((g) => g.key).sort()).toEqual([...CUTTER_GEOMETRIES].sort());
  });

  it("puts each material in a known group under a known parent", () => {
    for (const m of materials) {
      expect(MATERIAL_GROUPS).toContain(m.group);
      if (m.parent) expect(materialByKey(m.parent)?.group, m.key).toBe(m.group);
    }
  });

  it("widens a material key to the narrower keys under it", () => {
    expect(materialKeysWithin("aluminium").sort()).toEqual(["aluminium", "aluminium-5083", "aluminium-6061", "aluminium-6082"]);
    expect(materialKeysWithin("acrylic").sort()).toEqual(["acrylic", "acrylic-cast", "acrylic-extruded"]);
    expect(materialKeysWithin("mdf")).toEqual(["mdf"]);
    expect(materialKeysWithin("unobtainium")).toEqual([]);
  });

  it("derives synonym groups from the vocabulary, leaving loose words one-way", () => {
    expect(synonymGroups).toContainEqual(["acrylic", "pmma", "plexiglass", "plexi", "acrylic glass", "acrylic sheet"]);
    expect(synonymGroups.flat()).not.toContain("oak");
    expect(oneWaySynonyms.oak).toEqual(["hardwood"]);
    expect(oneWaySynonyms.carbon).toContain("carbon fibre");
    for (const group of synonymGroups) expect(new Set(group).size).toBe(group.length);
  });

  it("classifies catalogue material names for the index document", () => {
    expect(classifyMaterial(["Cast acrylic sheet"])).toEqual({ key: "acrylic-cast", group: "plastics" });
    expect(classifyMaterial(["Sheet stock", "Alu 6082-T6"])).toEqual({ key: "aluminium-6082", group: "non-ferrous" });
    expect(classifyMaterial(["White oak"])).toEqual({ key: "hardwood", group: "wood" });
    expect(classifyMaterial(["Mystery foam"])).toBeUndefined();
  });
});
