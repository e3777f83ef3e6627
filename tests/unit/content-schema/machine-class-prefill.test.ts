import { describe, expect, it } from "vitest";

import { machineClassPrefillSchema, prefillDefaults } from "@/content-schema/machine-class-prefill";

describe("machine-class prefill from a coverage gap", () => {
  it("reads the numbers from the query and hands them to the form as strings", () => {
    const prefill = machineClassPrefillSchema.parse({
      rpmMin: "6000",
      rpmMax: "12000",
      powerKw: "0.5",
      rigidity: "0.35",
      description: "For 14 machines",
      other: "x",
    });
    expect(prefill).toEqual({ rpmMin: 6000, rpmMax: 12000, powerKw: 0.5, rigidity: 0.35, description: "For 14 machines" });
    expect(prefillDefaults(prefill)).toEqual({
      rpmMin: "6000",
      rpmMax: "12000",
      powerKw: "0.5",
      rigidity: "0.35",
      description: "For 14 machines",
    });
  });

  it("drops what is malformed or out of range instead of prefilling it", () => {
    const prefill = machineClassPrefillSchema.parse({ rpmMin: "fast", rpmMax: "-5", powerKw: "1e9", rigidity: "1.5" });
    expect(prefill).toEqual({ rpmMin: undefined, rpmMax: undefined, powerKw: undefined, rigidity: undefined, description: undefined });
    expect(prefillDefaults(prefill)).toEqual({ description: "" });
  });
});
