import { describe, expect, it } from "vitest";

import { sheetOperationSchema } from "@/content-schema/sheet-operation";
import { replaceOperationValue, scaleOperationValue, suggestionChangeNote } from "@/lib/field/suggested-change";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { buildSheetSource, operationInput } from "@/tests/factories/sheet-source";

// Invented demo data: the factory's slot (n 18 000 rpm, vf 1800 mm/min, ap 1.5 mm, ae 100 %).
const op = (overrides: Record<string, unknown> = {}) => sheetOperationSchema.parse(operationInput(overrides));

describe("scaleOperationValue", () => {
  it("applies the factor to the named parameter, in the author's unit", () => {
    expect(scaleOperationValue(op(), "feedMmMin", 0.8)).toMatchObject({
      key: "vf",
      fromText: "1800 mm/min",
      toText: "1440 mm/min",
      toValue: 1440,
    });
    expect(scaleOperationValue(op(), "rpm", 0.9)).toMatchObject({ key: "n", toText: "16200 rpm", toValue: 16200 });
    expect(scaleOperationValue(op(), "axialDepthMm", 0.75)).toMatchObject({ key: "ap", toText: "1.13 mm" });
    expect(scaleOperationValue(op(), "plungeFeedMmMin", 1.1)).toMatchObject({ key: "plungeFeed", toText: "550 mm/min" });
  });

  it("keeps ae as a share of D, capped at 100 %", () => {
    expect(scaleOperationValue(op(), "radialDepthMm", 0.5)).toMatchObject({ key: "ae", toText: "50 %", toValue: 50 });
    expect(scaleOperationValue(op({ ae: "60 %" }), "radialDepthMm", 2)).toMatchObject({ toText: "100 %" });
  });

  it("writes inches where the author did (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    const scaled = scaleOperationValue(op({ vf: "70 in/min" }), "feedMmMin", 0.8)!;
    expect(scaled.toText).toBe("56 in/min");
    expect(scaled.toValue).toBeCloseTo(56 * 25.4, 9);
  });

  it("answers null for a value the operation does not have, and refuses a factor that is not positive", () => {
    expect(scaleOperationValue(op({ plungeFeed: undefined }), "plungeFeedMmMin", 0.9)).toBeNull();
    expect(() => scaleOperationValue(op(), "rpm", 0)).toThrow(RangeError);
  });
});

describe("replaceOperationValue", () => {
  it("changes only that operation's value; the source still validates and the body is kept", () => {
    const source = buildSheetSource();
    const changed = replaceOperationValue(source, 1, "vf", "1440 mm/min");
    const checked = validateSheetSource(changed);
    expect(checked.ok).toBe(true);
    expect(checked.frontMatter?.operations[1].vf).toEqual({ text: "1440 mm/min", value: 1440 });
    expect(checked.frontMatter?.operations[0].vf.value).toBe(1800);
    expect(changed.split("---\n")[2]).toBe(source.split("---\n")[2]);
  });

  it("refuses an operation the sheet does not have", () => {
    expect(() => replaceOperationValue(buildSheetSource(), 5, "vf", "1 mm/min")).toThrow(/no operation 6/);
  });
});

describe("suggestionChangeNote", () => {
  const facts = {
    param: "feedMmMin" as const,
    operationLabel: "Full-width slot",
    versionNumber: 2,
    reports: 5,
    lowered: 5,
    raised: 0,
    medianPct: -20,
    q1Pct: -30,
    q3Pct: -20,
    outcomes: 11,
    failed: 6,
    failure: { lower: 0.2, upper: 0.8 },
    confidenceLabel: "95 %",
    value: { key: "vf" as const, fromText: "1800 mm/min", toText: "1440 mm/min", fromValue: 1800, toValue: 1440 },
    engineWarnings: [],
    referenceMachine: "the Light router reference machine",
  };

  it("cites the counts, the spread and the failure interval, and the engine's verdict", () => {
    const note = suggestionChangeNote(facts);
    expect(note).toContain("1800 mm/min → 1440 mm/min");
    expect(note).toContain(
      "(−20 %) in 5 “worked after changes” reports on version 2 (5 lowered, 0 raised; the middle half ran −30 % to −20 %)",
    );
    expect(note).toContain("failed in 6 of 11 outcome reports (95 % interval 20 %–80 %)");
    expect(note).toContain("no warning for the changed operation");
  });

  it("names each engine warning, and stays within the change note's 1000 characters", () => {
    expect(suggestionChangeNote({ ...facts, engineWarnings: ["Feed capped at the machine's maximum: 5000 mm/min."] })).toContain(
      "raises a warning: Feed capped",
    );
    expect(
      suggestionChangeNote({ ...facts, engineWarnings: Array.from({ length: 40 }, () => "A long warning sentence from the engine.") })
        .length,
    ).toBeLessThanOrEqual(1000);
  });
});
