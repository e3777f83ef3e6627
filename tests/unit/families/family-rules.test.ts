import { describe, expect, it } from "vitest";

import { familyFormSchema, familyRulesSchema, familyRulesTextSchema, familyRulesToText } from "@/content-schema/family";
import { cellSlug } from "@/lib/families/cell-slug";
import { resolveRule, ruleKey } from "@/lib/families/resolve-rule";

const rules = familyRulesSchema.parse({
  kinds: ["slotting", "profile"],
  rules: [
    { materialGroup: "plastics", kind: "profile", machineClass: "light-router", apPerD: 0.5 },
    { materialGroup: "plastics", kind: "profile", apPerD: 1, chipLoadPosition: 0.4 },
    { materialGroup: "wood", kind: "profile", apPerD: 2 },
  ],
});

describe("family rules", () => {
  it("a machine class's own rule overrides the group-wide one field by field, and both are named", () => {
    expect(resolveRule(rules, { materialGroup: "plastics", machineClassSlug: "light-router", kind: "profile" })).toEqual({
      rule: { apPerD: 0.5, chipLoadPosition: 0.4 },
      keys: ["plastics/profile", "plastics/profile@light-router"],
    });
    expect(resolveRule(rules, { materialGroup: "plastics", machineClassSlug: "rigid-router", kind: "profile" })).toEqual({
      rule: { apPerD: 1, chipLoadPosition: 0.4 },
      keys: ["plastics/profile"],
    });
    expect(resolveRule(rules, { materialGroup: "plastics", machineClassSlug: "rigid-router", kind: "slotting" })).toEqual({
      rule: {},
      keys: [],
    });
    expect(ruleKey({ materialGroup: "wood", kind: "pocket", machineClass: undefined })).toBe("wood/pocket");
  });

  it("rules round-trip through the YAML the editor shows, and bad rules are refused with the field named", () => {
    expect(familyRulesTextSchema.parse(familyRulesToText(rules))).toEqual(rules);
    const bad = familyRulesTextSchema.safeParse(
      "kinds: [slotting]\nrules:\n  - materialGroup: plastics\n    kind: slotting\n    apPerD: -1\n",
    );
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].path).toEqual(["rules", 0, "apPerD"]);
    expect(familyRulesTextSchema.safeParse("kinds: [slotting\n").error?.issues[0].message).toMatch(/not valid YAML/);
    expect(familyRulesTextSchema.safeParse("kinds: []\n").success).toBe(false);
  });

  it("the family form reshapes repeated fields and SKU lines, and checks the diameter range", () => {
    const id = "00000000-0000-4000-8000-000000000001";
    const parsed = familyFormSchema.parse({
      name: "Series",
      slug: "series",
      series: " SF-",
      skus: "A-1\nB-2, C-3",
      geometries: "o-flute",
      diameterMinMm: "3",
      diameterMaxMm: "",
      materialIds: id,
      machineClassIds: [id],
      kinds: ["slotting"],
    });
    expect(parsed.cutters).toEqual({
      series: "SF-",
      geometries: ["o-flute"],
      diameterMinMm: 3,
      diameterMaxMm: undefined,
      skus: ["A-1", "B-2", "C-3"],
    });
    expect(parsed.rules).toEqual({ kinds: ["slotting"], rules: [] });
    expect(
      familyFormSchema.safeParse({
        name: "Series",
        slug: "series",
        diameterMinMm: "8",
        diameterMaxMm: "3",
        materialIds: id,
        machineClassIds: id,
        kinds: "slotting",
      }).success,
    ).toBe(false);
  });

  it("generated slugs look like hand-made ones and stay within 60 characters", () => {
    expect(cellSlug({ materialSlug: "cast-acrylic", sku: "QC-P1-02", machineClassSlug: "light-router" })).toBe(
      "cast-acrylic-qc-p1-02-light-router",
    );
    const long = cellSlug({
      materialSlug: "a-very-long-material-name-that-goes-on",
      sku: "SKU_WITH/ODD CHARS-123456",
      machineClassSlug: "small-machining-centre",
      shortCode: "xy12",
    });
    expect(long.length).toBeLessThanOrEqual(60);
    expect(long).toMatch(/^[a-z0-9]+(?:-[a-z0-9]+)*$/);
    expect(long).toContain("xy12");
  });
});
