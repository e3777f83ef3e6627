import { describe, expect, it } from "vitest";

import {
  formatChipLoad,
  formatCuttingSpeed,
  formatFeed,
  formatLength,
  formatNumber,
  formatQuantity,
  formatSpindleSpeed,
  UNIT_SEPARATOR,
} from "@/lib/machining";

const nb = (text: string) => text.replace(/ /g, UNIT_SEPARATOR);

describe("formatQuantity", () => {
  it("joins number and unit with a no-break space", () => {
    expect(UNIT_SEPARATOR).toBe("\u00a0");
    expect(formatLength(6, "metric")).toBe(nb("6 mm"));
  });

  it.each([
    [3.175, "length", "metric", "3.175 mm"],
    [6.35, "length", "imperial", "0.25 in"], // 6.35 / 25.4
    [4.7625, "length", "imperial", "0.1875 in"],
    [12732.4, "spindleSpeed", "metric", "12730 rpm"], // to the nearest 10
    [845.6, "spindleSpeed", "imperial", "846 rpm"], // whole below 1000
    [1778.4, "feedRate", "metric", "1778 mm/min"],
    [1778, "feedRate", "imperial", "70.0 in/min"], // 1778 / 25.4
    [199.49, "cuttingSpeed", "metric", "199 m/min"],
    [45.67, "cuttingSpeed", "metric", "45.7 m/min"],
    [199.49, "cuttingSpeed", "imperial", "654 SFM"], // 199.49 / 0.3048 = 654.5
    // Chip loads to three significant figures, zeros kept.
    [0.05, "chipLoad", "metric", "0.0500 mm/tooth"],
    [0.0125, "chipLoad", "metric", "0.0125 mm/tooth"],
    [0.06366, "chipLoad", "metric", "0.0637 mm/tooth"],
    [0.25, "chipLoad", "metric", "0.250 mm/tooth"],
    [0.09996, "chipLoad", "metric", "0.100 mm/tooth"],
    [0.0508, "chipLoad", "imperial", "0.00200 in/tooth"],
    [0.0127, "chipLoad", "imperial", "0.000500 in/tooth"],
    [1.5, "power", "metric", "1.50 kW"],
    [1.5, "power", "imperial", "2.01 hp"], // 1.5 / 0.7457
    [0.0313, "power", "metric", "0.031 kW"],
    [76.4, "force", "metric", "76 N"],
    [200, "force", "imperial", "45.0 lbf"], // 200 / 4.448
    [9.549, "torque", "metric", "9.55 N·m"],
    [50, "removalRate", "metric", "50.0 cm³/min"],
    [40.96766, "removalRate", "imperial", "2.50 in³/min"],
    [0.025, "deflection", "metric", "0.025 mm"],
    [0.0254, "deflection", "imperial", "0.0010 in"],
  ] as const)("formats %d %s in %s as %s", (value, kind, system, text) => {
    expect(formatQuantity(value, kind, system)).toBe(nb(text));
  });

  it("shows a dash for missing or impossible values rather than NaN", () => {
    expect(formatQuantity(Number.NaN, "feedRate", "metric")).toBe("—");
    expect(formatQuantity(Number.POSITIVE_INFINITY, "length", "imperial")).toBe("—");
    expect(formatQuantity(null, "power", "metric")).toBe("—");
    expect(formatNumber(Number.NaN, "power", "metric")).toBe("—");
  });

  it("never prints a negative zero", () => {
    expect(formatLength(-0.00001, "metric")).toBe(nb("0 mm"));
  });

  it("has shorthand formatters", () => {
    expect(formatFeed(1800, "metric")).toBe(nb("1800 mm/min"));
    expect(formatCuttingSpeed(182.88, "imperial")).toBe(nb("600 SFM"));
    expect(formatChipLoad(0.0508, "imperial")).toBe(nb("0.00200 in/tooth"));
    expect(formatSpindleSpeed(18000)).toBe(nb("18000 rpm"));
    expect(formatNumber(1778, "feedRate", "imperial")).toBe("70.0");
  });
});
