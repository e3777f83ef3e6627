import { describe, expect, it } from "vitest";

import { adaptOperation } from "@/lib/adapt/adapt-context";
import { diffAdapted } from "@/lib/adapt/adapted-diff";
import { renderChangeAlert } from "@/lib/bench/change-alert-mail";
import { setupCsv } from "@/lib/bench/setup-csv";
import { setupSheetData } from "@/lib/bench/setup-sheet-data";
import { formatQuantity } from "@/lib/machining";

import { acrylicContext } from "../adapt/adapt-context-fixture";

const machine = { minRpm: 10000, maxRpm: 16000, spindlePowerKw: 0.8, maxFeedMmMin: 3000, rigidity: 0.35 };

describe("setup sheet data and CSV", () => {
  it("gives sheet and adapted numbers in the setup's units, one CSV row per quantity", () => {
    const result = adaptOperation(acrylicContext, 0, machine);
    const data = setupSheetData({
      context: acrylicContext,
      operationIndex: 0,
      result,
      setupName: "=HYPERLINK(1)",
      machineName: "Desk router",
      units: "imperial",
    });
    const csv = setupCsv(data).trim().split("\r\n");
    expect(csv[0]).toBe("setup,machine,sheet_version,operation,symbol,quantity,unit,sheet_value,adapted_value,changed");
    const vf = csv.find((l) => l.includes(",vf,Feed rate,"))!;
    // 1800 mm/min = 70.87 in/min; 1600 mm/min = 62.99 in/min (÷ 25.4).
    const [sheetValue, adaptedValue] = vf.split(",").slice(-3, -1).map(Number);
    expect(vf.endsWith(",yes")).toBe(true);
    expect(sheetValue).toBeCloseTo(1800 / 25.4, 1);
    expect(adaptedValue).toBeCloseTo(1600 / 25.4, 1);
    // A cell that starts like a formula is defused for spreadsheets.
    expect(csv[1].startsWith(`"'=HYPERLINK(1)"`)).toBe(true);
    expect(data.steps.some((s) => s.startsWith("Spindle speed range"))).toBe(true);
    expect(data.cautions.at(-1)).toMatch(/Starting points only/);
  });

  it("says what the customer changed, the stick-out and the entry, and never claims nothing changed beside a changed number", () => {
    // A machine that runs the sheet as written: the only change is the customer's own ap. Were the trail empty,
    // its note would say the changed numbers follow from the customer's changes.
    const strong = { minRpm: 6000, maxRpm: 30000, spindlePowerKw: 5, maxFeedMmMin: 20000, rigidity: 1 };
    const apMm = acrylicContext.operations[0].axialDepthMm / 2;
    const result = adaptOperation(acrylicContext, 0, strong, { axialDepthMm: apMm });
    const data = setupSheetData({
      context: acrylicContext,
      operationIndex: 0,
      result,
      setupName: "Slot",
      machineName: "Big router",
      units: "metric",
      overrides: { axialDepthMm: apMm },
      machineStickoutMm: 18,
    });
    expect(data.yourChanges).toEqual([`ap (axial depth): ${formatQuantity(apMm, "length", "metric")}`]);
    expect(data.rows.find((r) => r.symbol === "ap")?.changed).toBe(true);
    expect(data.stickout).toBe(`${formatQuantity(18, "length", "metric")} (the machine's usual)`);
    expect(data.entryMethod).toMatch(/plunge|ramp|enter/i);
    // The engine records the customer's ap as a step of its own (model 2), so the trail names the change.
    expect(data.steps).toHaveLength(1);
    expect(data.steps[0]).toMatch(/depth override.*You set this depth of cut/);
    expect(data.noStepsNote).toBe("No rule changed a number. The numbers marked changed follow from your changes.");
    expect(data.noStepsNote).not.toContain("runs as written");
    const csv = setupCsv(data);
    expect(csv).toContain(",L,Stick-out,,,");
    expect(csv).toContain(",Entry method,,,");
    expect(csv).toContain(`,Your change,,,ap (axial depth): ${formatQuantity(apMm, "length", "metric")},yes`);
  });

  it("renders a change alert with the re-adapted diff and the stop link", () => {
    const before = adaptOperation(acrylicContext, 0, machine);
    const after = adaptOperation({ ...acrylicContext, operations: [{ ...acrylicContext.operations[0], feedMmMin: 1440 }] }, 0, machine);
    const mail = renderChangeAlert({
      vendorName: "Northbeck",
      sheetTitle: "Acrylic",
      oldNumber: 1,
      newNumber: 2,
      changeNote: "",
      versionUrl: "http://x/v/2",
      stopUrl: "http://x/stop?token=t",
      units: "metric",
      sheetDiff: [],
      setups: [
        {
          setupName: "Slot",
          machineName: "Desk",
          operationLabel: "Slot",
          setupUrl: "http://x/s",
          changes: diffAdapted(before, after),
          error: null,
        },
      ],
    });
    expect(mail.text).toContain("vf (feed rate): 1600\u00a0mm/min → 1280\u00a0mm/min");
    expect(mail.text).toContain("Stop these e-mails: http://x/stop?token=t");
    expect(mail.html).toContain('href="http://x/stop?token=t"');
  });
});
