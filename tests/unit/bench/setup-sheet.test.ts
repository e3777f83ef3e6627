import { describe, expect, it } from "vitest";

import { adaptOperation } from "@/lib/bench/adapt-context";
import { renderChangeAlert } from "@/lib/bench/change-alert-mail";
import { diffAdapted } from "@/lib/bench/adapted-diff";
import { setupCsv } from "@/lib/bench/setup-csv";
import { setupSheetData } from "@/lib/bench/setup-sheet-data";

import { acrylicContext } from "../adapt/adapt-context-fixture";

const machine = { minRpm: 10000, maxRpm: 16000, spindlePowerKw: 0.8, maxFeedMmMin: 3000, rigidity: 0.35 };

describe("setup sheet data and CSV", () => {
  it("gives sheet and adapted numbers in the setup's units, one CSV row per quantity", () => {
    const result = adaptOperation(acrylicContext, 0, machine);
    const data = setupSheetData({ context: acrylicContext, operationIndex: 0, result, setupName: "=HYPERLINK(1)", machineName: "Desk router", units: "imperial" });
    const csv = setupCsv(data).trim().split("\r\n");
    expect(csv[0]).toBe("setup,machine,sheet_version,operation,symbol,quantity,unit,sheet_value,adapted_value");
    const vf = csv.find((l) => l.includes(",vf,Feed rate,"))!;
    // 1800 mm/min = 70.87 in/min; 1600 mm/min = 62.99 in/min (÷ 25.4).
    const [sheetValue, adaptedValue] = vf.split(",").slice(-2).map(Number);
    expect(sheetValue).toBeCloseTo(1800 / 25.4, 1);
    expect(adaptedValue).toBeCloseTo(1600 / 25.4, 1);
    // A cell that starts like a formula is defused for spreadsheets.
    expect(csv[1].startsWith(`"'=HYPERLINK(1)"`)).toBe(true);
    expect(data.steps.some((s) => s.startsWith("Spindle speed range"))).toBe(true);
    expect(data.cautions.at(-1)).toMatch(/Starting points only/);
  });

  it("renders a change alert with the re-adapted diff and the stop link", () => {
    const before = adaptOperation(acrylicContext, 0, machine);
    const after = adaptOperation({ ...acrylicContext, operations: [{ ...acrylicContext.operations[0], feedMmMin: 1440 }] }, 0, machine);
    const mail = renderChangeAlert({ vendorName: "Northbeck", sheetTitle: "Acrylic", oldNumber: 1, newNumber: 2, changeNote: "", versionUrl: "http://x/v/2", stopUrl: "http://x/stop?token=t", units: "metric", sheetDiff: [], setups: [{ setupName: "Slot", machineName: "Desk", operationLabel: "Slot", setupUrl: "http://x/s", changes: diffAdapted(before, after), error: null }] });
    expect(mail.text).toContain("vf (feed rate): 1600\u00a0mm/min → 1280\u00a0mm/min");
    expect(mail.text).toContain("Stop these e-mails: http://x/stop?token=t");
    expect(mail.html).toContain('href="http://x/stop?token=t"');
  });
});
