import { describe, expect, it } from "vitest";

import { MachiningInputError, parseChipLoad, parseCuttingSpeed, parseFeed, parseLength, parseSpindleSpeed } from "@/lib/machining";

// 1 in = 25.4 mm exactly (NIST SP 811), so 1/8 in = 3.175 mm and 1 1/4 in = 31.75 mm.
describe("parseLength", () => {
  it.each([
    ["1/8", 3.175],
    ["1/8 in", 3.175],
    ['1 1/4"', 31.75],
    ["1-1/4 in", 31.75],
    ['0.125"', 3.175],
    ["0.125 in", 3.175],
    [".125in", 3.175],
    ["1/4 inch", 6.35],
    ["3.175mm", 3.175],
    ["3.175 mm", 3.175],
    ["6 mm", 6],
    ["6\u00a0mm", 6],
    ["1.2 cm", 12],
    [" 12 ", 12],
  ])("reads %s as %d mm", (text, mm) => {
    expect(parseLength(text)).toBeCloseTo(mm, 10);
  });

  it("treats a bare decimal by the default unit, and a bare fraction as inches (trade convention)", () => {
    expect(parseLength("0.25", { defaultUnit: "in" })).toBeCloseTo(6.35, 10);
    expect(parseLength("0.25")).toBe(0.25);
    expect(parseLength("1/4", { defaultUnit: "mm" })).toBeCloseTo(6.35, 10);
  });

  it.each(["", "   ", "abc", "mm", "1/0", "-3 mm", "3 mmm", "1//8", "6 m", "1e3 mm", "3,5 mm", "1 1/4 1/2"])("refuses %j", (text) => {
    expect(() => parseLength(text)).toThrow(MachiningInputError);
  });

  it("names the field in the error", () => {
    try {
      parseLength("banana", { field: "operation.diameter" });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(MachiningInputError);
      expect((error as MachiningInputError).field).toBe("operation.diameter");
      expect((error as Error).message).toContain("banana");
    }
  });

  it("refuses a non-string", () => {
    expect(() => parseLength(12 as unknown as string)).toThrow(MachiningInputError);
  });
});

describe("parseFeed", () => {
  it.each([
    ["1800 mm/min", 1800],
    ["1800mm/min", 1800],
    ["70 in/min", 1778], // 70 × 25.4
    ["70 ipm", 1778],
    ["1.8 m/min", 1800],
    ["1800", 1800],
  ])("reads %s as %d mm/min", (text, mmMin) => {
    expect(parseFeed(text)).toBeCloseTo(mmMin, 9);
  });

  it("uses the default unit for a bare number", () => {
    expect(parseFeed("10", { defaultUnit: "in/min" })).toBeCloseTo(254, 9);
  });

  it.each(["fast", "70 in/sec", "-5 mm/min", "", "1/0 ipm"])("refuses %j", (text) => {
    expect(() => parseFeed(text)).toThrowError(MachiningInputError);
  });
});

describe("parseSpindleSpeed", () => {
  it.each([
    ["18000", 18000],
    ["18000 rpm", 18000],
    ["18000rpm", 18000],
    ["18k rpm", 18000],
    ["18k", 18000],
    ["18,000 rpm", 18000],
    ["24 krpm", 24000],
    ["12000 min-1", 12000],
  ])("reads %s as %d rpm", (text, rpm) => {
    expect(parseSpindleSpeed(text)).toBe(rpm);
  });

  it.each(["fast", "1/2 rpm", "18000 rps", "rpm", "-100 rpm"])("refuses %j", (text) => {
    expect(() => parseSpindleSpeed(text)).toThrowError(MachiningInputError);
  });
});

describe("parseChipLoad", () => {
  it.each([
    ["0.05 mm", 0.05],
    ["0.05 mm/tooth", 0.05],
    ["0.002 in", 0.0508], // 0.002 × 25.4
    ['0.002"', 0.0508],
    ["0.002 ipt", 0.0508],
  ])("reads %s as %d mm/tooth", (text, mm) => {
    expect(parseChipLoad(text)).toBeCloseTo(mm, 12);
  });

  it.each(["thin", "0.05 mm/min", "0.05 kg"])("refuses %j", (text) => {
    expect(() => parseChipLoad(text)).toThrowError(MachiningInputError);
  });
});

describe("parseCuttingSpeed", () => {
  it("reads SFM and m/min", () => {
    expect(parseCuttingSpeed("600 SFM")).toBeCloseTo(182.88, 10); // 600 × 0.3048
    expect(parseCuttingSpeed("200 m/min")).toBe(200);
    expect(() => parseCuttingSpeed("quick")).toThrowError(MachiningInputError);
  });
});
