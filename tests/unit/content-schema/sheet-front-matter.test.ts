import { describe, expect, it } from "vitest";

import {
  cautionKindLabels,
  entryMethodLabels,
  operationKindLabels,
  operationKinds,
  sheetFrontMatterSchema,
} from "@/content-schema/sheet-front-matter";
import { frontMatterInput, operationInput } from "@/tests/factories/sheet-source";

describe("sheet front matter schema", () => {
  it("accepts the factory's valid front matter and fills defaults", () => {
    const parsed = sheetFrontMatterSchema.parse(frontMatterInput({ cautions: undefined, tags: undefined }));
    expect(parsed.cautions).toEqual([]);
    expect(parsed.tags).toEqual([]);
    expect(parsed.operations[0].vf).toEqual({ text: "1800 mm/min", value: 1800 });
  });

  it("reads the old key of constant-engagement clearing from stored versions as the current key", () => {
    const parsed = sheetFrontMatterSchema.parse(frontMatterInput({ operations: [operationInput({ kind: "adaptive" })] }));
    expect(parsed.operations[0].kind).toBe("constant-engagement");
    expect(operationKinds).not.toContain("adaptive");
    expect(operationKindLabels["constant-engagement"]).toBe("Constant-engagement clearing");
  });

  it("needs at least one operation", () => {
    const result = sheetFrontMatterSchema.safeParse(frontMatterInput({ operations: [] }));
    expect(result.error?.issues[0].path).toEqual(["operations"]);
  });

  it("refuses unknown keys at every level, so typos are caught", () => {
    for (const input of [
      frontMatterInput({ titel: "x" }),
      frontMatterInput({ operations: [operationInput({ fedd: "1800 mm/min" })] }),
      frontMatterInput({ cautions: [{ kind: "fire", text: "Keep an extinguisher near.", level: 3 }] }),
    ]) {
      const result = sheetFrontMatterSchema.safeParse(input);
      expect(result.error?.issues.map((i) => i.code)).toContain("unrecognized_keys");
    }
  });

  it("refuses an unknown operation kind, entry method or caution kind", () => {
    expect(sheetFrontMatterSchema.safeParse(frontMatterInput({ operations: [operationInput({ kind: "boring" })] })).success).toBe(false);
    expect(sheetFrontMatterSchema.safeParse(frontMatterInput({ operations: [operationInput({ entry: "drop" })] })).success).toBe(false);
    expect(sheetFrontMatterSchema.safeParse(frontMatterInput({ cautions: [{ kind: "noise", text: "Loud." }] })).success).toBe(false);
  });

  it("allows a ramp angle only with ramp or helical entry", () => {
    const onPlunge = sheetFrontMatterSchema.safeParse(
      frontMatterInput({ operations: [operationInput({ entry: "plunge", rampAngleDeg: 3 })] }),
    );
    expect(onPlunge.error?.issues[0].path).toEqual(["operations", 0, "rampAngleDeg"]);
    const onHelix = sheetFrontMatterSchema.safeParse(
      frontMatterInput({ operations: [operationInput({ entry: "helical", rampAngleDeg: 2 })] }),
    );
    expect(onHelix.success).toBe(true);
  });

  it("requires slugs for material and machine class", () => {
    expect(sheetFrontMatterSchema.safeParse(frontMatterInput({ material: "Cast Acrylic" })).success).toBe(false);
  });

  it("labels every kind in the schema", () => {
    expect(Object.keys(operationKindLabels)).toEqual([...operationKinds]);
    for (const labels of [operationKindLabels, entryMethodLabels, cautionKindLabels]) {
      for (const label of Object.values(labels)) expect(label.length).toBeGreaterThan(2);
    }
  });
});
