import { describe, expect, it } from "vitest";

import { deriveOperation } from "@/lib/sheets/derive-starting-data";

const cutter = { diameterMm: 6, flutes: 2, cornerForm: "square" };
const material = { materialGroup: "wood", vcMinMpm: 300, vcMaxMpm: 600, minChipLoadMm: 0.05 };

describe("deriveOperation", () => {
  it("takes n from the middle of the vc window and vf = fz·z·n (lib/machining/README.md)", () => {
    const op = deriveOperation({ cutter, material, machine: { rpmMin: 6000, rpmMax: 24000, maxFeedMmMin: 15000, rigidity: 1 }, kind: "profile" });
    // n = 1000·450/(π·6) = 23873 rpm → 23900 rpm; fz = 0.016·6 = 0.096 mm; vf = 0.096·2·23900 = 4588.8 → 4590 mm/min.
    expect(op.n).toBe("23900 rpm");
    expect(op.vf).toBe("4590 mm/min");
  });

  it("lowers n rather than fz when the machine's feed limit is reached", () => {
    const op = deriveOperation({ cutter, material, machine: { rpmMin: 6000, rpmMax: 24000, maxFeedMmMin: 3000, rigidity: 1 }, kind: "profile" });
    // n = 3000/(2·0.096) = 15625 → 15600 rpm, vf = 0.096·2·15600 = 2995.2 → 3000 mm/min.
    expect(op.n).toBe("15600 rpm");
    expect(op.vf).toBe("3000 mm/min");
    expect(op.derived.fzMm).toBeGreaterThan(material.minChipLoadMm);
  });
});
