import { describe, expect, it } from "vitest";

import { chipLoadSchema, feedSchema, lengthSchema, radialDepthSchema, spindleSpeedSchema } from "@/content-schema/quantity";

// 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
const MM_PER_IN = 25.4;

describe("quantity schemas keep the author's text and the metric value", () => {
  it.each([
    ["3.175 mm", 3.175],
    ["1/8 in", MM_PER_IN / 8],
    ['0.125"', 0.125 * MM_PER_IN],
    ["1 1/4 in", 1.25 * MM_PER_IN],
  ])("length %s is %f mm", (text, mm) => {
    const q = lengthSchema.parse(text);
    expect(q.text).toBe(text);
    expect(q.value).toBeCloseTo(mm, 9);
  });

  it("converts feeds to mm/min", () => {
    expect(feedSchema.parse("1800 mm/min")).toEqual({ text: "1800 mm/min", value: 1800 });
    expect(feedSchema.parse("70 in/min").value).toBeCloseTo(70 * MM_PER_IN, 9);
  });

  it("reads spindle speed in rpm and chip load in mm per tooth", () => {
    expect(spindleSpeedSchema.parse("18000 rpm").value).toBe(18000);
    expect(chipLoadSchema.parse("0.002 in").value).toBeCloseTo(0.002 * MM_PER_IN, 12);
    expect(chipLoadSchema.parse("0.05 mm").value).toBe(0.05);
  });

  it("trims surrounding space but keeps the written form otherwise", () => {
    expect(lengthSchema.parse("  6 mm ").text).toBe("6 mm");
  });
});

describe("quantity schemas refuse what a data sheet must not say", () => {
  it.each(["fast", "", "3", "1/8", "18000"])("refuses %j (no number or no unit)", (text) => {
    expect(lengthSchema.safeParse(text).success).toBe(false);
  });

  it("refuses zero and numbers not written as text", () => {
    expect(feedSchema.safeParse("0 mm/min").success).toBe(false);
    expect(spindleSpeedSchema.safeParse(18000).success).toBe(false);
  });

  it("names the expected quantity in the message", () => {
    const result = feedSchema.safeParse("fast");
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toMatch(/feed rate/);
  });
});

describe("radial depth ae", () => {
  it("accepts a length in mm", () => {
    expect(radialDepthSchema.parse("0.5 mm")).toEqual({ text: "0.5 mm", value: 0.5, unit: "mm" });
  });

  it("accepts a percentage of the cutter diameter", () => {
    expect(radialDepthSchema.parse("40 %")).toEqual({ text: "40 %", value: 40, unit: "%D" });
    expect(radialDepthSchema.parse("12.5%").value).toBe(12.5);
    expect(radialDepthSchema.parse("40 % of D")).toEqual({ text: "40 % of D", value: 40, unit: "%D" });
  });

  it.each(["0 %", "120 %", "40 %%", "-5 %", "wide"])("refuses %j", (text) => {
    expect(radialDepthSchema.safeParse(text).success).toBe(false);
  });
});
