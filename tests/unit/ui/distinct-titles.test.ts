import { describe, expect, it } from "vitest";

import { distinctTitles } from "@/lib/ui/distinct-titles";

describe("titles that would repeat", () => {
  it("get their machine class; unique titles stay as they are", () => {
    const sheets = [
      { title: "MDF, 6 mm two-flute", kind: "Light belt-drive router" },
      { title: "MDF, 6 mm two-flute", kind: "Rigid ball-screw router" },
      { title: "Cast acrylic, 1/8 in", kind: "Light belt-drive router" },
    ];
    expect(
      distinctTitles(
        sheets,
        (s) => s.title,
        (s) => s.kind,
      ),
    ).toEqual(["MDF, 6 mm two-flute · Light belt-drive router", "MDF, 6 mm two-flute · Rigid ball-screw router", "Cast acrylic, 1/8 in"]);
  });
});
